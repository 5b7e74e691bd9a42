using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Ledger;

/// <summary>
/// One logged scoring request: who decided (version and role), with what score, band and
/// reasons, under which plan revision. The current outcome is kept beside it so reports
/// aggregate without a join over every observation.
/// </summary>
public sealed class Decision
{
    public Guid Id { get; set; }

    public long ScorecardId { get; set; }

    public required string ApplicationId { get; set; }

    public required string IdempotencyKey { get; set; }

    /// <summary>SHA-256 of the canonical request body; a replay with another body is refused.</summary>
    public required string RequestHash { get; set; }

    public string? AssignmentKey { get; set; }

    /// <summary>The date the performance window runs from.</summary>
    public DateOnly ApplicationDate { get; set; }

    public DateTimeOffset DecidedAt { get; set; }

    public int PlanRevision { get; set; }

    /// <summary>The deciding version.</summary>
    public int Version { get; set; }

    public ArmRole Role { get; set; }

    public decimal Score { get; set; }

    public double ProbabilityOfBad { get; set; }

    /// <summary>What the deciding version's bands answered.</summary>
    public Band Band { get; set; }

    /// <summary>Reason codes as JSON, as answered.</summary>
    public required string ReasonCodes { get; set; }

    /// <summary>Current outcome class (null until an outcome is posted).</summary>
    public PerformanceClass? Outcome { get; set; }

    /// <summary>True once the outcome is final for performance figures (bad in window, or window elapsed).</summary>
    public bool Matured { get; set; }

    public DateOnly? OutcomeObservedAt { get; set; }

    public List<DecisionScore> Scores { get; } = [];
}
