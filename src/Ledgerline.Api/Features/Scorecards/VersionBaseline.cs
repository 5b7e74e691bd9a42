namespace Ledgerline.Api.Features.Scorecards;

/// <summary>
/// What a version looked like on its development sample, kept as aggregates only (the sample
/// rows are never stored). Stability and performance reports compare live figures with it.
/// </summary>
public sealed class VersionBaseline
{
    public long VersionId { get; set; }

    /// <summary>The aggregates as JSON (see <c>BaselineAggregates</c>).</summary>
    public required string Aggregates { get; set; }

    public DateTimeOffset AttachedAt { get; set; }

    public required string AttachedBy { get; set; }
}
