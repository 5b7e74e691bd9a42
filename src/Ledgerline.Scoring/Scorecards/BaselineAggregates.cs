namespace Ledgerline.Scoring.Scorecards;

/// <summary>
/// A version's development baseline, as aggregates only: the score distribution over fixed score
/// bins, each characteristic's bin shares and, when the sample carried outcomes, the development
/// AUC, Gini and KS. Memory grows with distinct scores and bins, never with the sample size.
/// </summary>
/// <param name="SampleSize">Rows in the development sample.</param>
/// <param name="Bads">Bad rows, when the sample carried outcomes.</param>
/// <param name="EdgeRule">How the score bin edges were chosen: <c>deciles</c> or <c>given</c>.</param>
/// <param name="ScoreBins">Score bins, right-closed: bin k holds scores in (upTo[k−1], upTo[k]]; the last has no upper edge.</param>
/// <param name="ScoreHistogram">Count (and bads) per distinct development score, ascending.</param>
/// <param name="Characteristics">Per characteristic, in version order: counts per bin, missing and other.</param>
/// <param name="Discrimination">Development AUC, Gini and KS, when the sample carried outcomes.</param>
public sealed record BaselineAggregates(
    long SampleSize,
    long? Bads,
    string EdgeRule,
    IReadOnlyList<ScoreBinCount> ScoreBins,
    IReadOnlyList<DevelopmentScoreCount> ScoreHistogram,
    IReadOnlyList<CharacteristicDistribution> Characteristics,
    DevelopmentDiscrimination? Discrimination);

/// <summary>One score bin of the baseline: scores above the previous edge up to and including <paramref name="UpTo"/>.</summary>
/// <param name="UpTo">Upper edge (inclusive); null on the last bin.</param>
/// <param name="Count">Development rows in the bin.</param>
/// <param name="Share">Count / sample size.</param>
/// <param name="Bads">Bad rows in the bin, when known.</param>
public sealed record ScoreBinCount(decimal? UpTo, long Count, double Share, long? Bads);

/// <summary>How many development rows had one score, and how many of them were bad.</summary>
public sealed record DevelopmentScoreCount(decimal Score, long Count, long? Bads);

/// <summary>How a characteristic's values fell into its bins on the development sample.</summary>
/// <param name="Name">The characteristic.</param>
/// <param name="BinCounts">Rows per bin, in bin order.</param>
/// <param name="Missing">Rows with no value (missing points applied).</param>
/// <param name="Other">Rows with an unlisted category (other points applied).</param>
public sealed record CharacteristicDistribution(string Name, IReadOnlyList<long> BinCounts, long Missing, long Other);

/// <summary>Development discrimination: AUC (good above bad, ties half), Gini = 2·AUC − 1, KS and the score where it peaks.</summary>
public sealed record DevelopmentDiscrimination(double Auc, double AucVariance, double Gini, double Ks, decimal KsScore);
