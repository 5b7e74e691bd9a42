namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Goods and bads observed at one score: one row of a score histogram. Higher scores mean lower
/// risk, so goods are expected at the top of the scale.
/// </summary>
/// <param name="Score">The score (points); any finite value.</param>
/// <param name="Goods">Number of good outcomes at this score; zero or more.</param>
/// <param name="Bads">Number of bad outcomes at this score; zero or more.</param>
public sealed record ScoreCount(double Score, long Goods, long Bads)
{
    /// <summary>Goods plus bads at this score.</summary>
    public long Total => Goods + Bads;
}
