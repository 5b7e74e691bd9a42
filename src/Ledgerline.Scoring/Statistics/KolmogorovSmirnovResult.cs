namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Two-sample Kolmogorov–Smirnov statistic between the score distributions of goods and bads.
/// Null values come with a <see cref="Reason"/>.
/// </summary>
/// <param name="Statistic">max over observed scores s of |F_bad(s) − F_good(s)|, in [0, 1]; null without both classes.</param>
/// <param name="Score">The smallest score at which the maximum is reached, i.e. the cut-off "reject if score ≤ s"; null as <paramref name="Statistic"/>.</param>
/// <param name="Points">The two cumulative distributions at each distinct score; empty without both classes.</param>
/// <param name="Reason">Why a value is null; null when every value is present.</param>
public sealed record KolmogorovSmirnovResult(
    double? Statistic,
    double? Score,
    IReadOnlyList<KolmogorovSmirnovPoint> Points,
    string? Reason);
