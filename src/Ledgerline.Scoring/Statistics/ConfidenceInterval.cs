namespace Ledgerline.Scoring.Statistics;

/// <summary>A two-sided confidence interval.</summary>
/// <param name="Lower">Lower bound.</param>
/// <param name="Upper">Upper bound.</param>
public sealed record ConfidenceInterval(double Lower, double Upper);
