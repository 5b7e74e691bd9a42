namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// The Kolmogorov–Smirnov statistic as used in credit scoring (Thomas, Edelman &amp; Crook,
/// "Credit Scoring and Its Applications", SIAM, 2002): the largest gap between the cumulative score
/// distributions of bads and goods. Equal to scipy 1.10.1 <c>ks_2samp</c>'s D.
/// </summary>
public static class KolmogorovSmirnov
{
    /// <summary>Computes the statistic, the score where it peaks and the curve points.</summary>
    /// <param name="histogram">Goods and bads per score.</param>
    /// <returns>
    /// The result; with empty input or one class only, statistic and score are null with a reason.
    /// When the maximum is reached at several scores (for example where both distributions rise by the
    /// same share) the smallest score is reported. A single distinct score gives 0 at that score.
    /// </returns>
    public static KolmogorovSmirnovResult Compute(ScoreHistogram histogram)
    {
        long goods = histogram.TotalGoods;
        long bads = histogram.TotalBads;
        if (goods == 0 || bads == 0)
        {
            return new KolmogorovSmirnovResult(null, null, [],
                histogram.Total == 0 ? "No decisions with an outcome." : "The KS statistic needs at least one good and one bad.");
        }

        var counts = histogram.Counts;
        var points = new KolmogorovSmirnovPoint[counts.Count];
        long goodsAtOrBelow = 0;
        long badsAtOrBelow = 0;
        Int128 bestGap = -1;
        var bestScore = 0.0;
        for (var k = 0; k < counts.Count; k++)
        {
            goodsAtOrBelow += counts[k].Goods;
            badsAtOrBelow += counts[k].Bads;

            // Compared in exact integer arithmetic, |c_bad·G − c_good·B|, so equal gaps at different
            // scores tie exactly and the smallest score wins.
            var gap = Int128.Abs(((Int128)badsAtOrBelow * goods) - ((Int128)goodsAtOrBelow * bads));
            if (gap > bestGap)
            {
                bestGap = gap;
                bestScore = counts[k].Score;
            }

            var goodShare = (double)goodsAtOrBelow / goods;
            var badShare = (double)badsAtOrBelow / bads;
            points[k] = new KolmogorovSmirnovPoint(counts[k].Score, goodShare, badShare, Math.Abs(badShare - goodShare));
        }

        var statistic = (double)bestGap / ((double)goods * bads);
        return new KolmogorovSmirnovResult(statistic, bestScore, points, null);
    }
}
