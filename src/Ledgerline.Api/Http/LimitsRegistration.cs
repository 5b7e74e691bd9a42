using System.Globalization;
using System.Net;
using System.Security.Claims;
using System.Threading.RateLimiting;
using Microsoft.AspNetCore.Http.Timeouts;
using Microsoft.AspNetCore.RateLimiting;
using Microsoft.Extensions.Options;

namespace Ledgerline.Api.Http;

/// <summary>
/// Per-key rate limits (the framework's token bucket, one bucket per key id; per client address
/// for requests without a key) and request timeouts. A flood from one key is answered 429 with
/// Retry-After while every other key keeps being served.
/// </summary>
public static class LimitsRegistration
{
    /// <summary>The request timeout policy for bulk routes: <c>.WithRequestTimeout(LimitsRegistration.BulkTimeoutPolicy)</c>.</summary>
    public const string BulkTimeoutPolicy = "bulk";

    public static IServiceCollection AddLedgerlineLimits(this IServiceCollection services)
    {
        services.AddOptions<LimitsOptions>().BindConfiguration(LimitsOptions.Section).ValidateDataAnnotations().ValidateOnStart();
        services.AddRateLimiter(_ => { });
        services.AddOptions<RateLimiterOptions>().Configure<IOptions<LimitsOptions>>((o, limits) =>
        {
            var l = limits.Value;
            o.GlobalLimiter = PartitionedRateLimiter.Create<HttpContext, string>(context =>
            {
                var keyId = context.User.FindFirstValue(ClaimTypes.NameIdentifier);
                return keyId is not null
                    ? RateLimitPartition.GetTokenBucketLimiter("key:" + keyId, _ => Bucket(l.PermitsPerSecond, l.Burst))
                    : RateLimitPartition.GetTokenBucketLimiter(
                        "address:" + (context.Connection.RemoteIpAddress ?? IPAddress.None),
                        _ => Bucket(l.AnonymousPermitsPerSecond, l.AnonymousPermitsPerSecond));
            });
            o.OnRejected = RejectAsync;
        });
        services.AddRequestTimeouts();
        services.AddOptions<RequestTimeoutOptions>().Configure<IOptions<LimitsOptions>>((o, limits) =>
        {
            o.DefaultPolicy = new RequestTimeoutPolicy
            {
                Timeout = TimeSpan.FromSeconds(limits.Value.RequestTimeoutSeconds),
                TimeoutStatusCode = StatusCodes.Status504GatewayTimeout,
            };
            o.AddPolicy(BulkTimeoutPolicy, new RequestTimeoutPolicy
            {
                Timeout = TimeSpan.FromSeconds(limits.Value.BulkRequestTimeoutSeconds),
                TimeoutStatusCode = StatusCodes.Status504GatewayTimeout,
            });
        });
        return services;
    }

    /// <summary>Runs after authentication, so the limiter knows the key.</summary>
    public static WebApplication UseLedgerlineLimits(this WebApplication app)
    {
        app.UseRateLimiter();
        app.UseRequestTimeouts();
        return app;
    }

    private static TokenBucketRateLimiterOptions Bucket(int perSecond, int burst) => new()
    {
        TokenLimit = burst,
        TokensPerPeriod = perSecond,
        ReplenishmentPeriod = TimeSpan.FromSeconds(1),
        QueueLimit = 0,
        AutoReplenishment = true,
    };

    private static async ValueTask RejectAsync(OnRejectedContext rejected, CancellationToken ct)
    {
        var context = rejected.HttpContext;
        var wait = rejected.Lease.TryGetMetadata(MetadataName.RetryAfter, out var retryAfter) ? retryAfter : TimeSpan.FromSeconds(1);
        var seconds = Math.Max(1, (int)Math.Ceiling(wait.TotalSeconds));
        context.Response.StatusCode = StatusCodes.Status429TooManyRequests;
        context.Response.Headers.RetryAfter = seconds.ToString(CultureInfo.InvariantCulture);
        var problems = context.RequestServices.GetRequiredService<IProblemDetailsService>();
        await problems.WriteAsync(new ProblemDetailsContext
        {
            HttpContext = context,
            ProblemDetails =
            {
                Status = StatusCodes.Status429TooManyRequests,
                Title = "Too many requests",
                Detail = $"This key has used its request rate; retry after {seconds} second{(seconds == 1 ? "" : "s")} (see Retry-After), or spread the requests out.",
            },
        });
    }
}
