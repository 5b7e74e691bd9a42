namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Goods and bads per distinct score, merged and sorted by score ascending (riskiest first).
/// Memory grows with the number of distinct scores, never with the number of decisions.
/// </summary>
public sealed class ScoreHistogram
{
    private readonly ScoreCount[] _counts;

    /// <summary>
    /// Builds a histogram from counts in any order; rows with the same score are added together and
    /// rows with no goods and no bads are dropped.
    /// </summary>
    /// <param name="counts">Counts per score; may be empty.</param>
    /// <exception cref="ArgumentException">A score is not finite or a count is negative.</exception>
    public ScoreHistogram(IEnumerable<ScoreCount> counts)
    {
        var merged = new Dictionary<double, (long Goods, long Bads)>();
        foreach (var count in counts)
        {
            if (!double.IsFinite(count.Score))
            {
                throw new ArgumentException($"Score {count.Score} is not a finite number.", nameof(counts));
            }

            if (count.Goods < 0 || count.Bads < 0)
            {
                throw new ArgumentException($"Negative count at score {count.Score}.", nameof(counts));
            }

            // -0.0 and 0.0 are the same score.
            var score = count.Score == 0 ? 0 : count.Score;
            merged.TryGetValue(score, out var sum);
            merged[score] = (checked(sum.Goods + count.Goods), checked(sum.Bads + count.Bads));
        }

        _counts = merged
            .Where(pair => pair.Value.Goods + pair.Value.Bads > 0)
            .Select(pair => new ScoreCount(pair.Key, pair.Value.Goods, pair.Value.Bads))
            .OrderBy(count => count.Score)
            .ToArray();
        TotalGoods = _counts.Sum(count => count.Goods);
        TotalBads = _counts.Sum(count => count.Bads);
    }

    /// <summary>Counts per distinct score, score ascending; every row has at least one decision.</summary>
    public IReadOnlyList<ScoreCount> Counts => _counts;

    /// <summary>Number of goods over all scores.</summary>
    public long TotalGoods { get; }

    /// <summary>Number of bads over all scores.</summary>
    public long TotalBads { get; }

    /// <summary>Number of decisions with an outcome (goods plus bads).</summary>
    public long Total => TotalGoods + TotalBads;

    /// <summary>The distribution of scores regardless of outcome, score ascending.</summary>
    public IReadOnlyList<ScoreFrequency> ToFrequencies() =>
        _counts.Select(count => new ScoreFrequency(count.Score, count.Total)).ToArray();
}
