using System.ComponentModel.DataAnnotations;

namespace Ledgerline.Api.Http;

/// <summary>The <c>Limits</c> configuration section: per-key request rates and request timeouts.</summary>
public sealed class LimitsOptions
{
    public const string Section = "Limits";

    /// <summary>
    /// Requests each key may make per second, sustained. Generous by default: one origination
    /// system scoring thousands of applications a second must not be throttled.
    /// </summary>
    [Range(1, int.MaxValue)]
    public int PermitsPerSecond { get; set; } = 10_000;

    /// <summary>Requests a key may make at once above the sustained rate (the bucket size).</summary>
    [Range(1, int.MaxValue)]
    public int Burst { get; set; } = 20_000;

    /// <summary>Requests without a valid key, per client address and second (they are answered 401 anyway).</summary>
    [Range(1, int.MaxValue)]
    public int AnonymousPermitsPerSecond { get; set; } = 100;

    /// <summary>How long an ordinary request may run before it is answered 504.</summary>
    [Range(1, 3600)]
    public int RequestTimeoutSeconds { get; set; } = 30;

    /// <summary>How long a bulk request (baselines, batches, outcome files) may run.</summary>
    [Range(1, 3600)]
    public int BulkRequestTimeoutSeconds { get; set; } = 300;
}
