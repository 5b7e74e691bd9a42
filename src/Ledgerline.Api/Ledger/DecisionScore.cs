using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;
namespace Ledgerline.Api.Ledger;

/// <summary>
/// The score one version in the plan gave one application, deciding or not. Raw input values
/// are not stored: the matched bins are what stability needs, and points follow from them and
/// the immutable version.
/// </summary>
/// <remarks>
/// The row also carries what the reports group by — the application date, the plan revision, the
/// champion's score of the same application, what the decider answered and the current outcome
/// (kept in step with <see cref="Decision"/> by outcome ingestion) — so that every report reads one
/// index in its grouping order: no join over a million decisions and no sort of a million rows.
/// </remarks>
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

    public Band? Band { get; set; }

    /// <summary>Matched bin per characteristic in version order, comma separated (-1 missing, -2 other).</summary>
    public string? MatchedBins { get; set; }

    public string? Error { get; set; }

    public DateOnly ApplicationDate { get; set; }

    public int PlanRevision { get; set; }

    /// <summary>The champion of the plan revision that decided the application.</summary>
    public int ChampionVersion { get; set; }

    /// <summary>The champion's score of the same application (null when the champion could not score it).</summary>
    public decimal? ChampionScore { get; set; }

    /// <summary>What the deciding version answered.</summary>
    public Band DecisionBand { get; set; }

    /// <summary>The decision's current outcome, as on <see cref="Decision.Outcome"/>.</summary>
    public PerformanceClass? Outcome { get; set; }

    /// <summary>As on <see cref="Decision.Matured"/>.</summary>
    public bool Matured { get; set; }
}
