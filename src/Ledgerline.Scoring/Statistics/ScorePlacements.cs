namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// DeLong placement values per distinct score. With tied scores the placement of a decision depends
/// only on its score, so the O(N log N) mid-rank form of Sun &amp; Xu ("Fast implementation of
/// DeLong's algorithm for comparing the areas under correlated receiver operating characteristic
/// curves", IEEE Signal Processing Letters, 2014) reduces to one pass over a sorted histogram.
/// Goods play the role of DeLong's positives X, bads the negatives Y, psi(x, y) = 1 if x &gt; y,
/// 1/2 if tied (DeLong, DeLong &amp; Clarke-Pearson, Biometrics, 1988).
/// </summary>
internal sealed class ScorePlacements
{
    private ScorePlacements(
        IReadOnlyList<ScoreCount> counts,
        double[] goodPlacements,
        double[] badPlacements,
        long goods,
        long bads,
        double auc)
    {
        Counts = counts;
        GoodPlacements = goodPlacements;
        BadPlacements = badPlacements;
        Goods = goods;
        Bads = bads;
        Auc = auc;
    }

    /// <summary>Counts per distinct score, ascending.</summary>
    public IReadOnlyList<ScoreCount> Counts { get; }

    /// <summary>V10 of a good at each score: share of bads below it, ties counting half.</summary>
    public double[] GoodPlacements { get; }

    /// <summary>V01 of a bad at each score: share of goods above it, ties counting half.</summary>
    public double[] BadPlacements { get; }

    public long Goods { get; }

    public long Bads { get; }

    public double Auc { get; }

    /// <summary>Requires at least one good and one bad.</summary>
    public static ScorePlacements From(ScoreHistogram histogram)
    {
        var counts = histogram.Counts;
        long goods = histogram.TotalGoods;
        long bads = histogram.TotalBads;
        var goodPlacements = new double[counts.Count];
        var badPlacements = new double[counts.Count];
        long badsBelow = 0;
        long goodsAtOrBelow = 0;
        double wins = 0;
        for (var k = 0; k < counts.Count; k++)
        {
            var count = counts[k];
            goodsAtOrBelow += count.Goods;
            long goodsAbove = goods - goodsAtOrBelow;
            goodPlacements[k] = (badsBelow + (0.5 * count.Bads)) / bads;
            badPlacements[k] = (goodsAbove + (0.5 * count.Goods)) / goods;
            wins += count.Goods * (badsBelow + (0.5 * count.Bads));
            badsBelow += count.Bads;
        }

        var auc = wins / ((double)goods * bads);
        return new ScorePlacements(counts, goodPlacements, badPlacements, goods, bads, auc);
    }

    /// <summary>S10 = Σ over goods of (V10 − AUC)² / (m − 1); needs at least two goods.</summary>
    public double GoodPlacementVariance()
    {
        double sum = 0;
        for (var k = 0; k < Counts.Count; k++)
        {
            var deviation = GoodPlacements[k] - Auc;
            sum += Counts[k].Goods * deviation * deviation;
        }

        return sum / (Goods - 1);
    }

    /// <summary>S01 = Σ over bads of (V01 − AUC)² / (n − 1); needs at least two bads.</summary>
    public double BadPlacementVariance()
    {
        double sum = 0;
        for (var k = 0; k < Counts.Count; k++)
        {
            var deviation = BadPlacements[k] - Auc;
            sum += Counts[k].Bads * deviation * deviation;
        }

        return sum / (Bads - 1);
    }

    /// <summary>DeLong variance of the AUC: S10/m + S01/n.</summary>
    public double Variance() => (GoodPlacementVariance() / Goods) + (BadPlacementVariance() / Bads);

    /// <summary>Index of each distinct score in <see cref="Counts"/>.</summary>
    public Dictionary<double, int> IndexByScore()
    {
        var index = new Dictionary<double, int>(Counts.Count);
        for (var k = 0; k < Counts.Count; k++)
        {
            index[Counts[k].Score] = k;
        }

        return index;
    }
}
