namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Number of decisions at one score, without outcomes: the input for score distributions
/// (population stability, bin cut points).
/// </summary>
/// <param name="Score">The score (points); any finite value.</param>
/// <param name="Count">Number of decisions at this score; zero or more.</param>
public sealed record ScoreFrequency(double Score, long Count);
