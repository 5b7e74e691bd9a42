namespace Ledgerline.Api.Features.Scorecards;

/// <summary>
/// One immutable points table. Only the lifecycle columns (status and who/when of approval and
/// retirement) ever change after registration; the content is fixed by its hash.
/// </summary>
public sealed class ScorecardVersion
{
    public long Id { get; set; }

    public long ScorecardId { get; set; }

    public Scorecard? Scorecard { get; set; }

    /// <summary>1, 2, 3… per scorecard, given by the server.</summary>
    public int Number { get; set; }

    public VersionStatus Status { get; set; }

    /// <summary>SHA-256 (hex) of the canonical JSON in <see cref="Content"/>.</summary>
    public required string ContentHash { get; set; }

    /// <summary>The canonical JSON of the points table.</summary>
    public required string Content { get; set; }

    public DateTimeOffset RegisteredAt { get; set; }

    public required string RegisteredBy { get; set; }

    public DateTimeOffset? ApprovedAt { get; set; }

    public string? ApprovedBy { get; set; }

    public DateTimeOffset? RetiredAt { get; set; }

    public string? RetiredBy { get; set; }

    public VersionBaseline? Baseline { get; set; }
}

/// <summary>Lifecycle of a version: only approved versions take traffic.</summary>
public enum VersionStatus
{
    Draft = 0,
    Approved = 1,
    Retired = 2,
}
