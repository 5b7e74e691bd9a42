using Ledgerline.Scoring.Outcomes;

namespace Ledgerline.Api.Ledger;

/// <summary>One posted observation of an account's performance; every one is kept for audit.</summary>
public sealed class OutcomeObservation
{
    public long Id { get; set; }

    public Guid DecisionId { get; set; }

    public DateOnly ObservedAt { get; set; }

    public int? WorstDaysPastDue { get; set; }

    public bool? ChargedOff { get; set; }

    /// <summary>An explicit status, when one was posted.</summary>
    public PerformanceClass? Status { get; set; }

    /// <summary>How this observation classifies under the outcome definition.</summary>
    public PerformanceClass? Classified { get; set; }

    public DateTimeOffset ReceivedAt { get; set; }
}
