using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class RocTests
{
    [Theory]
    [InlineData("s100b")]
    [InlineData("wfns")]
    [InlineData("ndka")]
    public void Compute_AsahMarker_MatchesPRocAucVarianceAndDeLongInterval(string marker)
    {
        // R 4.2.2, pROC 1.18.0: auc(), var(method='delong'), ci.auc(method='delong') (REFERENCE.md §2)
        var histogram = ReferenceData.AsahHistogram(ReferenceData.Asah, Marker(marker));

        var result = Roc.Compute(histogram);

        Close.Relative(ReferenceData.R($"asah.{marker}.auc"), result.Auc);
        Close.Relative(ReferenceData.R($"asah.{marker}.var_delong"), result.Variance);
        Close.Relative(ReferenceData.R($"asah.{marker}.ci_lower"), result.ConfidenceInterval?.Lower);
        Close.Relative(ReferenceData.R($"asah.{marker}.ci_upper"), result.ConfidenceInterval?.Upper);
        Assert.Equal(41, result.Goods);
        Assert.Equal(72, result.Bads);
        Assert.Null(result.Reason);
    }

    [Theory]
    [InlineData("s100b")]
    [InlineData("wfns")]
    [InlineData("ndka")]
    public void Compute_AsahMarker_AucEqualsMannWhitneyUOverProduct(string marker)
    {
        // scipy 1.10.1 mannwhitneyu: U of Poor / (41·72) (REFERENCE.md §2, results_py.tsv)
        var histogram = ReferenceData.AsahHistogram(ReferenceData.Asah, Marker(marker));

        var result = Roc.Compute(histogram);

        Close.Relative(ReferenceData.Python($"asah.{marker}.mwu_U_poor") / (41.0 * 72.0), result.Auc);
    }

    [Theory]
    [InlineData("score_a")]
    [InlineData("score_b")]
    public void Compute_GermanScore_MatchesPRocAucGiniVarianceAndInterval(string score)
    {
        // R 4.2.2, pROC 1.18.0, roc(direction='>') with Good as controls (REFERENCE.md §3)
        var histogram = ReferenceData.GermanHistogram(score == "score_a" ? row => row.ScoreA : row => row.ScoreB);

        var result = Roc.Compute(histogram);

        Close.Relative(ReferenceData.R($"german.{score}.auc"), result.Auc);
        Close.Relative(ReferenceData.R($"german.{score}.gini"), result.Gini);
        Close.Relative(ReferenceData.R($"german.{score}.var_delong"), result.Variance);
        Close.Relative(ReferenceData.R($"german.{score}.ci_lower"), result.ConfidenceInterval?.Lower);
        Close.Relative(ReferenceData.R($"german.{score}.ci_upper"), result.ConfidenceInterval?.Upper);
    }

    [Fact]
    public void Compute_GermanScoreA_AucEqualsMannWhitneyUOverProduct()
    {
        // scipy 1.10.1 mannwhitneyu(score[Good], score[Bad]): U / (700·300) (REFERENCE.md §3)
        var result = Roc.Compute(ReferenceData.GermanHistogram(row => row.ScoreA));

        Close.Relative(ReferenceData.Python("german.score_a.mwu_U_good") / (700.0 * 300.0), result.Auc);
    }

    [Fact]
    public void Compute_SmallTextbookExample_MatchesPublishedAucAndGini()
    {
        // methods.md §2.1 check value computed with R 4.2.2 / pROC 1.18.0: AUC 0.883333, Gini 0.766667
        var histogram = Histogram([620, 640, 655, 660, 670, 680, 690, 700, 710, 720], [580, 600, 610, 630, 650, 665]);

        var result = Roc.Compute(histogram);

        Close.Relative(0.883333, result.Auc, 1e-6);
        Close.Relative(0.766667, result.Gini, 1e-6);
    }

    [Fact]
    public void Compute_ReversedScores_GivesOneMinusAuc()
    {
        // Law: reversing the order of the scores swaps wins and losses, ties stay ties (common practice)
        var histogram = ReferenceData.GermanHistogram(row => row.ScoreA);
        var reversed = new ScoreHistogram(histogram.Counts.Select(count => count with { Score = -count.Score }));

        var forward = Roc.Compute(histogram);
        var backward = Roc.Compute(reversed);

        Close.Relative(1 - forward.Auc!.Value, backward.Auc, 1e-12);
        Close.Relative(forward.Variance!.Value, backward.Variance, 1e-10);
    }

    [Fact]
    public void Compute_OnlyGoods_ReturnsNullAucWithReason()
    {
        // Edge case by definition: AUC needs both classes (common practice)
        var result = Roc.Compute(new ScoreHistogram([new ScoreCount(600, 10, 0), new ScoreCount(610, 5, 0)]));

        Assert.Null(result.Auc);
        Assert.Null(result.Gini);
        Assert.Null(result.Variance);
        Assert.NotNull(result.Reason);
        Assert.Empty(result.Points);
    }

    [Fact]
    public void Compute_EmptyHistogram_ReturnsNullAucWithReason()
    {
        // Edge case by definition (common practice)
        var result = Roc.Compute(new ScoreHistogram([]));

        Assert.Null(result.Auc);
        Assert.NotNull(result.Reason);
    }

    [Fact]
    public void Compute_SingleScore_GivesHalfWithZeroVariance()
    {
        // All pairs tie, so every pair counts half (Hanley & McNeil 1982; common practice)
        var result = Roc.Compute(new ScoreHistogram([new ScoreCount(600, 30, 7)]));

        Assert.Equal(0.5, result.Auc);
        Assert.Equal(0.0, result.Gini);
        Assert.Equal(0.0, result.Variance);
        Assert.Equal(new ConfidenceInterval(0.5, 0.5), result.ConfidenceInterval);
    }

    [Fact]
    public void Compute_OneGoodOneBad_GivesAucWithoutVariance()
    {
        // DeLong's placement variances divide by (m − 1) and (n − 1) (DeLong et al. 1988)
        var result = Roc.Compute(new ScoreHistogram([new ScoreCount(600, 1, 0), new ScoreCount(500, 0, 1)]));

        Assert.Equal(1.0, result.Auc);
        Assert.Null(result.Variance);
        Assert.Null(result.ConfidenceInterval);
        Assert.NotNull(result.Reason);
    }

    [Fact]
    public void Compute_Points_RunFromOriginToOneOneAndAreaEqualsAuc()
    {
        // Trapezoid area under the ROC curve equals the Mann–Whitney AUC with ties counting half (Hanley & McNeil 1982)
        var result = Roc.Compute(ReferenceData.GermanHistogram(row => row.ScoreA));

        Assert.Equal(new RocPoint(null, 0, 0), result.Points[0]);
        Assert.Equal(1.0, result.Points[^1].FalsePositiveRate, 12);
        Assert.Equal(1.0, result.Points[^1].TruePositiveRate, 12);
        var area = result.Points.Zip(result.Points.Skip(1))
            .Sum(pair => (pair.Second.FalsePositiveRate - pair.First.FalsePositiveRate) * (pair.First.TruePositiveRate + pair.Second.TruePositiveRate) / 2);
        Close.Relative(result.Auc!.Value, area, 1e-12);
    }

    [Fact]
    public void ScoreHistogram_UnsortedDuplicateRows_AreMergedAndSorted()
    {
        // Construction contract of the histogram (common practice)
        var histogram = new ScoreHistogram([new ScoreCount(620, 1, 0), new ScoreCount(580, 0, 2), new ScoreCount(620, 3, 1), new ScoreCount(700, 0, 0)]);

        Assert.Equal([new ScoreCount(580, 0, 2), new ScoreCount(620, 4, 1)], histogram.Counts);
        Assert.Equal(4, histogram.TotalGoods);
        Assert.Equal(3, histogram.TotalBads);
    }

    [Fact]
    public void ScoreHistogram_NotANumberScore_Throws()
    {
        // Programmer error: scores must be finite (documented exception)
        Assert.Throws<ArgumentException>(() => new ScoreHistogram([new ScoreCount(double.NaN, 1, 0)]));
    }

    internal static Func<ReferenceData.AsahRow, double> Marker(string marker) => marker switch
    {
        "s100b" => row => row.S100b,
        "wfns" => row => row.Wfns,
        "ndka" => row => row.Ndka,
        _ => throw new ArgumentOutOfRangeException(nameof(marker)),
    };

    internal static ScoreHistogram Histogram(IEnumerable<double> goods, IEnumerable<double> bads) =>
        new(goods.Select(score => new ScoreCount(score, 1, 0)).Concat(bads.Select(score => new ScoreCount(score, 0, 1))));
}
