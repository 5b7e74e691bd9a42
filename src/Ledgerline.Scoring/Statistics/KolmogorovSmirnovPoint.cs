namespace Ledgerline.Scoring.Statistics;

/// <summary>Cumulative distributions of goods and bads at one score, F(s) = share with score ≤ s.</summary>
/// <param name="Score">The score s.</param>
/// <param name="CumulativeGoodShare">F_good(s).</param>
/// <param name="CumulativeBadShare">F_bad(s).</param>
/// <param name="Separation">|F_bad(s) − F_good(s)|.</param>
public sealed record KolmogorovSmirnovPoint(double Score, double CumulativeGoodShare, double CumulativeBadShare, double Separation);
