using System.Text.Json;
using System.Text.Json.Serialization;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.AspNetCore.Http.Metadata;

namespace Ledgerline.Api.Http;

/// <summary>JSON, errors and OpenAPI: the conventions every feature shares.</summary>
public static class HttpRegistration
{
    /// <summary>Default request body limit; routes that take bulk bodies set their own.</summary>
    public const long DefaultBodyLimitBytes = 1024 * 1024;

    public static IServiceCollection AddLedgerlineHttp(this IServiceCollection services)
    {
        services.Configure<JsonOptions>(o => ConfigureJson(o.SerializerOptions));
        services.Configure<RouteHandlerOptions>(o => o.ThrowOnBadRequest = true);
        services.AddProblemDetails(o => o.CustomizeProblemDetails = c =>
        {
            c.ProblemDetails.Extensions["traceId"] = c.HttpContext.TraceIdentifier;
            c.ProblemDetails.Instance ??= c.HttpContext.Request.Path;
            if (c.ProblemDetails.Status == StatusCodes.Status413PayloadTooLarge)
            {
                // The server refuses an oversized body before the endpoint sees it; say which limit.
                c.ProblemDetails.Detail ??= BadRequestExceptionHandler.TooLargeDetail(c.HttpContext);
            }
        });
        services.AddExceptionHandler<BadRequestExceptionHandler>();
        services.Configure<Microsoft.AspNetCore.Server.Kestrel.Core.KestrelServerOptions>(o => o.Limits.MaxRequestBodySize = DefaultBodyLimitBytes);
        services.AddLedgerlineOpenApi();
        services.AddLedgerlineLimits();
        return services;
    }

    public static void ConfigureJson(JsonSerializerOptions options)
    {
        options.PropertyNamingPolicy = JsonNamingPolicy.CamelCase;
        options.DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull;
        options.Converters.Add(new JsonStringEnumConverter(JsonNamingPolicy.CamelCase, allowIntegerValues: false));
        options.NumberHandling = JsonNumberHandling.Strict;
        options.UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow;
    }

    public static WebApplication UseLedgerlineHttp(this WebApplication app)
    {
        app.UseExceptionHandler();
        app.UseStatusCodePages();
        app.UseLedgerlineOpenApi();
        return app;
    }

    /// <summary>Sets the body size limit of a route that takes bulk input.</summary>
    public static TBuilder WithBodyLimit<TBuilder>(this TBuilder builder, long bytes)
        where TBuilder : IEndpointConventionBuilder =>
        builder.WithMetadata(new RequestSizeLimitMetadata(bytes));

    private sealed class RequestSizeLimitMetadata(long bytes) : IRequestSizeLimitMetadata
    {
        public long? MaxRequestBodySize => bytes;
    }
}
