namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Goods and bads among the applications that received score A from one version and score B from
/// another (shadow scoring): one cell of the joint (score A, score B, outcome) table.
/// </summary>
/// <param name="ScoreA">Score from version A; finite.</param>
/// <param name="ScoreB">Score from version B; finite.</param>
/// <param name="Goods">Good outcomes in this cell; zero or more.</param>
/// <param name="Bads">Bad outcomes in this cell; zero or more.</param>
public sealed record PairedScoreCount(double ScoreA, double ScoreB, long Goods, long Bads);
