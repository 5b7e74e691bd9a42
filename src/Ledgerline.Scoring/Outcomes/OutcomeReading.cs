namespace Ledgerline.Scoring.Outcomes;

/// <summary>
/// One posted observation of an account. A reading gives worst days past due so far, a
/// charge-off flag, an explicit status, or a consistent combination of them.
/// </summary>
/// <param name="ObservedAt">The date the servicing system observed the account (its "as at" date).</param>
/// <param name="WorstDaysPastDue">Worst days past due from the application date up to <paramref name="ObservedAt"/>; whole days, not negative.</param>
/// <param name="ChargedOff">True when the account was charged off by <paramref name="ObservedAt"/>.</param>
/// <param name="Status">A class the servicing system assigned itself; taken as given.</param>
public readonly record struct OutcomeReading(DateOnly ObservedAt, int? WorstDaysPastDue, bool? ChargedOff, PerformanceClass? Status);
