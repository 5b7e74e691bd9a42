namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// ROC analysis from a score histogram. AUC equals the Mann–Whitney statistic U/(goods·bads)
/// (Hanley &amp; McNeil, "The meaning and use of the area under a ROC curve", Radiology, 1982);
/// the variance is DeLong's (DeLong, DeLong &amp; Clarke-Pearson, "Comparing the areas under two or
/// more correlated receiver operating characteristic curves", Biometrics, 1988), the same estimator
/// as pROC's <c>var(method = "delong")</c>.
/// </summary>
public static class Roc
{
    /// <summary>Computes AUC, Gini, DeLong variance, 95% confidence interval and the ROC points.</summary>
    /// <param name="histogram">Goods and bads per score; higher score = lower risk.</param>
    /// <returns>
    /// The result. Empty input or one class only: AUC, Gini, variance and interval are null with a
    /// reason. Fewer than two goods or two bads: AUC is given, the variance and interval are null.
    /// A single distinct score gives AUC 0.5 with variance 0.
    /// </returns>
    public static RocResult Compute(ScoreHistogram histogram) => Compute(histogram, 0.95);

    /// <summary>As <see cref="Compute(ScoreHistogram)"/> with a chosen confidence level.</summary>
    /// <param name="histogram">Goods and bads per score; higher score = lower risk.</param>
    /// <param name="confidenceLevel">Two-sided level in (0, 1), e.g. 0.95.</param>
    /// <exception cref="ArgumentOutOfRangeException">The level is outside (0, 1).</exception>
    public static RocResult Compute(ScoreHistogram histogram, double confidenceLevel)
    {
        if (!(confidenceLevel is > 0 and < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(confidenceLevel), "The confidence level must lie in (0, 1).");
        }

        long goods = histogram.TotalGoods;
        long bads = histogram.TotalBads;
        if (goods == 0 || bads == 0)
        {
            var reason = histogram.Total == 0
                ? "No decisions with an outcome."
                : goods == 0 ? "Only bads: the AUC needs at least one good and one bad." : "Only goods: the AUC needs at least one good and one bad.";
            return new RocResult(goods, bads, null, null, null, null, [], reason);
        }

        var placements = ScorePlacements.From(histogram);
        var auc = placements.Auc;
        var points = Points(histogram);
        if (goods < 2 || bads < 2)
        {
            return new RocResult(goods, bads, auc, (2 * auc) - 1, null, null, points,
                "The DeLong variance needs at least two goods and two bads.");
        }

        var variance = placements.Variance();
        var halfWidth = StandardNormal.TwoSidedCritical(confidenceLevel) * Math.Sqrt(variance);
        var interval = new ConfidenceInterval(Math.Max(0, auc - halfWidth), Math.Min(1, auc + halfWidth));
        return new RocResult(goods, bads, auc, (2 * auc) - 1, variance, interval, points, null);
    }

    private static RocPoint[] Points(ScoreHistogram histogram)
    {
        var counts = histogram.Counts;
        var points = new RocPoint[counts.Count + 1];
        points[0] = new RocPoint(null, 0, 0);
        long goodsAtOrBelow = 0;
        long badsAtOrBelow = 0;
        for (var k = 0; k < counts.Count; k++)
        {
            goodsAtOrBelow += counts[k].Goods;
            badsAtOrBelow += counts[k].Bads;
            points[k + 1] = new RocPoint(
                counts[k].Score,
                (double)goodsAtOrBelow / histogram.TotalGoods,
                (double)badsAtOrBelow / histogram.TotalBads);
        }

        return points;
    }
}
