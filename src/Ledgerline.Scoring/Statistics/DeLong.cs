using MathNet.Numerics.Distributions;

namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Comparisons of AUCs by DeLong, DeLong &amp; Clarke-Pearson, "Comparing the areas under two or
/// more correlated receiver operating characteristic curves: a nonparametric approach", Biometrics,
/// 1988. The paired test runs over aggregated cells in the manner of Sun &amp; Xu, "Fast
/// implementation of DeLong's algorithm", IEEE Signal Processing Letters, 2014.
/// </summary>
public static class DeLong
{
    private const string SameRankingReason =
        "The two versions rank the applications the same way: the difference has zero variance, so no test statistic exists.";

    /// <summary>
    /// Paired test of AUC A against AUC B from counts per (score A, score B, outcome). Placement values
    /// depend only on the score, so they are computed once per distinct score of each version from its
    /// marginal histogram; variances and the covariance are then summed over the joint cells. Time
    /// O(C + K log K) for C cells and K distinct scores; memory O(K).
    /// </summary>
    /// <param name="cells">Joint counts in any order; repeated (score A, score B) pairs are allowed.</param>
    /// <returns>
    /// The test. One class only or empty input: all statistics null with a reason. Fewer than two goods
    /// or two bads: AUCs and difference only. Zero variance of the difference (for example a version
    /// with itself): Z, p and interval null with a reason.
    /// </returns>
    /// <exception cref="ArgumentException">A score is not finite or a count is negative.</exception>
    public static PairedAucTest PairedTest(IEnumerable<PairedScoreCount> cells)
    {
        var cellList = cells as IReadOnlyCollection<PairedScoreCount> ?? cells.ToList();
        var histogramA = new ScoreHistogram(cellList.Select(cell => new ScoreCount(cell.ScoreA, cell.Goods, cell.Bads)));
        var histogramB = new ScoreHistogram(cellList.Select(cell => new ScoreCount(cell.ScoreB, cell.Goods, cell.Bads)));
        long goods = histogramA.TotalGoods;
        long bads = histogramA.TotalBads;
        if (goods == 0 || bads == 0)
        {
            return new PairedAucTest(goods, bads, null, null, null, null, null, null, null, null, null,
                "The AUC needs at least one good and one bad.");
        }

        var a = ScorePlacements.From(histogramA);
        var b = ScorePlacements.From(histogramB);
        var difference = a.Auc - b.Auc;
        if (goods < 2 || bads < 2)
        {
            return new PairedAucTest(goods, bads, a.Auc, b.Auc, null, null, null, difference, null, null, null,
                "The DeLong variance needs at least two goods and two bads.");
        }

        var indexA = a.IndexByScore();
        var indexB = b.IndexByScore();
        double goodSum = 0;
        double badSum = 0;
        foreach (var cell in cellList)
        {
            if (cell.Goods == 0 && cell.Bads == 0)
            {
                continue;
            }

            var ka = indexA[cell.ScoreA == 0 ? 0 : cell.ScoreA];
            var kb = indexB[cell.ScoreB == 0 ? 0 : cell.ScoreB];
            goodSum += cell.Goods * (a.GoodPlacements[ka] - a.Auc) * (b.GoodPlacements[kb] - b.Auc);
            badSum += cell.Bads * (a.BadPlacements[ka] - a.Auc) * (b.BadPlacements[kb] - b.Auc);
        }

        var covariance = (goodSum / (goods - 1) / goods) + (badSum / (bads - 1) / bads);
        var varianceA = a.Variance();
        var varianceB = b.Variance();
        var differenceVariance = varianceA + varianceB - (2 * covariance);

        // Rounding can leave a tiny positive or negative residue where the exact value is zero.
        if (!(differenceVariance > 1e-12 * (varianceA + varianceB)))
        {
            return new PairedAucTest(goods, bads, a.Auc, b.Auc, varianceA, varianceB, covariance, difference,
                null, null, null, SameRankingReason);
        }

        var standardError = Math.Sqrt(differenceVariance);
        var z = difference / standardError;
        var halfWidth = StandardNormal.TwoSidedCritical(0.95) * standardError;
        return new PairedAucTest(goods, bads, a.Auc, b.Auc, varianceA, varianceB, covariance, difference,
            z, StandardNormal.TwoSidedP(z), new ConfidenceInterval(difference - halfWidth, difference + halfWidth), null);
    }

    /// <summary>
    /// Unpaired test of two AUCs from independent samples (different applications), following pROC
    /// 1.18.0 (Robin et al., "pROC: an open-source package for R and S+", BMC Bioinformatics, 2011):
    /// D = (AUC A − AUC B)/√(VarA + VarB), Student t with df = (VarA + VarB)² / (VarA²/(NA − 1) +
    /// VarB²/(NB − 1)).
    /// </summary>
    /// <param name="a">The first curve, from <see cref="Roc.Compute(ScoreHistogram)"/>.</param>
    /// <param name="b">The second curve.</param>
    /// <returns>The test; statistics are null with a reason when either curve lacks an AUC or a variance, or both variances are zero.</returns>
    public static UnpairedAucTest UnpairedTest(RocResult a, RocResult b)
    {
        if (a.Auc is not { } aucA || b.Auc is not { } aucB)
        {
            return new UnpairedAucTest(a.Auc, b.Auc, null, null, null, null,
                "Both curves need an AUC (at least one good and one bad each).");
        }

        var difference = aucA - aucB;
        if (a.Variance is not { } varianceA || b.Variance is not { } varianceB)
        {
            return new UnpairedAucTest(aucA, aucB, difference, null, null, null,
                "Both curves need a DeLong variance (at least two goods and two bads each).");
        }

        var total = varianceA + varianceB;
        if (!(total > 0))
        {
            return new UnpairedAucTest(aucA, aucB, difference, null, null, null,
                "Both AUC variances are zero, so no test statistic exists.");
        }

        var statistic = difference / Math.Sqrt(total);
        var degreesOfFreedom = total * total /
            ((varianceA * varianceA / (a.Total - 1)) + (varianceB * varianceB / (b.Total - 1)));
        var p = Math.Min(1.0, 2 * StudentT.CDF(0, 1, degreesOfFreedom, -Math.Abs(statistic)));
        return new UnpairedAucTest(aucA, aucB, difference, statistic, degreesOfFreedom, p, null);
    }
}
