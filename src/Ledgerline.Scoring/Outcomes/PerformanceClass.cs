namespace Ledgerline.Scoring.Outcomes;

/// <summary>How an account performed under a scorecard's outcome definition.</summary>
public enum PerformanceClass
{
    /// <summary>Worst days past due below the indeterminate threshold, never charged off.</summary>
    Good = 0,

    /// <summary>Worst days past due at or beyond the bad threshold, or charged off.</summary>
    Bad = 1,

    /// <summary>Between the indeterminate and the bad threshold: counted, but left out of good/bad figures.</summary>
    Indeterminate = 2,
}
