namespace Ledgerline.Api.Features.Decisions;

/// <summary>
/// The score one version in the plan gave one application, deciding or not. Raw input values
/// are not stored: the matched bins are what stability needs, and points follow from them and
/// the immutable version.
/// </summary>
public sealed class DecisionScore
{
    public long Id { get; set; }

    public Guid DecisionId { get; set; }

    public long ScorecardId { get; set; }

    public int Version { get; set; }

    public ArmRole Role { get; set; }

    public bool Deciding { get; set; }

    /// <summary>Null when this version could not score the input (see <see cref="Error"/>).</summary>
    public decimal? Score { get; set; }

    public double? ProbabilityOfBad { get; set; }

    public string? Band { get; set; }

    /// <summary>Matched bin per characteristic in version order, comma separated (-1 missing, -2 other).</summary>
    public string? MatchedBins { get; set; }

    public string? Error { get; set; }
}
