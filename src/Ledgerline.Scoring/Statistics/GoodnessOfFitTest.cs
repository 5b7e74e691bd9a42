namespace Ledgerline.Scoring.Statistics;

/// <summary>Pearson chi-square goodness-of-fit test of observed counts against planned shares.</summary>
/// <param name="Statistic">Σ (O − E)²/E; null when undefined, with a reason.</param>
/// <param name="DegreesOfFreedom">Categories − 1.</param>
/// <param name="PValue">P(χ²_df ≥ statistic); null with the statistic.</param>
/// <param name="Total">Sum of the observed counts.</param>
/// <param name="Reason">Why values are null; null otherwise.</param>
public sealed record GoodnessOfFitTest(double? Statistic, int DegreesOfFreedom, double? PValue, long Total, string? Reason);
