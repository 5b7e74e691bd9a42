using System.Text.Json;
using Microsoft.AspNetCore.Diagnostics;

namespace Ledgerline.Api.Http;

/// <summary>
/// Turns malformed bodies and oversized requests into problem details a client can act on
/// (which part of the JSON, what limit), and every other failure into a plain 500 that leaks no
/// stack trace or SQL.
/// </summary>
internal sealed class BadRequestExceptionHandler(IProblemDetailsService problems, ILogger<BadRequestExceptionHandler> logger) : IExceptionHandler
{
    public async ValueTask<bool> TryHandleAsync(HttpContext httpContext, Exception exception, CancellationToken cancellationToken)
    {
        int status;
        string title;
        string detail;
        switch (exception)
        {
            case BadHttpRequestException { StatusCode: StatusCodes.Status413PayloadTooLarge }:
                status = StatusCodes.Status413PayloadTooLarge;
                title = "Request body too large";
                detail = TooLargeDetail(httpContext);
                break;
            case BadHttpRequestException { InnerException: JsonException json }:
                status = StatusCodes.Status400BadRequest;
                title = "Malformed JSON";
                detail = DescribeJsonError(json);
                break;
            case BadHttpRequestException bad:
                status = bad.StatusCode;
                title = "Bad request";
                detail = bad.Message;
                break;
            default:
                logger.LogError(exception, "Unhandled error on {Method} {Path}", httpContext.Request.Method, httpContext.Request.Path);
                return false;
        }

        httpContext.Response.StatusCode = status;
        return await problems.TryWriteAsync(new ProblemDetailsContext
        {
            HttpContext = httpContext,
            Exception = exception,
            ProblemDetails = { Status = status, Title = title, Detail = detail },
        });
    }

    /// <summary>What to do about a body over the limit; also used when the server refuses it before any handler runs.</summary>
    public static string TooLargeDetail(HttpContext context)
    {
        var limit = context.Features.Get<Microsoft.AspNetCore.Http.Features.IHttpMaxRequestBodySizeFeature>()?.MaxRequestBodySize;
        var described = limit is { } bytes ? $"{bytes:N0} bytes" : "the configured size";
        return $"The request body is over this route's limit of {described}; split it into smaller requests.";
    }

    private static string DescribeJsonError(JsonException json)
    {
        var where = string.IsNullOrEmpty(json.Path) || json.Path == "$" ? "the body" : $"'{json.Path}'";
        var line = json.LineNumber is { } l ? $" (line {l + 1}, position {json.BytePositionInLine + 1})" : string.Empty;
        var what = json.Message.Contains("could not be converted", StringComparison.Ordinal)
            ? "has a value of the wrong type or out of range (numbers must be finite JSON numbers, texts quoted, enums one of the documented words)"
            : json.Message.Contains("could not be mapped", StringComparison.Ordinal)
                ? "is not a field this request takes"
                : "is not valid JSON";
        return $"The request body could not be read: {where}{line} {what}.";
    }
}
