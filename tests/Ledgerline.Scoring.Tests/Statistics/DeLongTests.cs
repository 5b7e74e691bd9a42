using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class DeLongTests
{
    [Theory]
    [InlineData("wfns", "s100b")]
    [InlineData("s100b", "ndka")]
    public void PairedTest_AsahMarkers_MatchesPRocRocTest(string first, string second)
    {
        // R 4.2.2, pROC 1.18.0: roc.test(method='delong', paired=TRUE) (REFERENCE.md §2)
        var markerA = RocTests.Marker(first);
        var markerB = RocTests.Marker(second);
        var cells = ReferenceData.Asah.Select(row => new PairedScoreCount(markerA(row), markerB(row), row.Poor ? 1 : 0, row.Poor ? 0 : 1));

        var test = DeLong.PairedTest(cells);

        var key = $"asah.test_{first}_vs_{second}";
        Close.Relative(ReferenceData.R($"{key}.Z"), test.Z);
        Close.Relative(ReferenceData.R($"{key}.p"), test.PValue);
        Close.Relative(ReferenceData.R($"{key}.auc1_{first}"), test.AucA);
        Close.Relative(ReferenceData.R($"{key}.auc2_{second}"), test.AucB);
        Close.Relative(ReferenceData.R($"{key}.diff_ci_lower"), test.DifferenceConfidenceInterval?.Lower);
        Close.Relative(ReferenceData.R($"{key}.diff_ci_upper"), test.DifferenceConfidenceInterval?.Upper);
        Close.Relative(ReferenceData.R($"asah.{first}.var_delong"), test.VarianceA);
        Close.Relative(ReferenceData.R($"asah.{second}.var_delong"), test.VarianceB);
        Assert.Equal(113, test.Total);
    }

    [Fact]
    public void PairedTest_WfnsAgainstS100b_MatchesIssueFigures()
    {
        // R 4.2.2, pROC 1.18.0 (REFERENCE.md §2 table): Z = 2.208984, p = 0.02717578
        var cells = ReferenceData.Asah.Select(row => new PairedScoreCount(row.Wfns, row.S100b, row.Poor ? 1 : 0, row.Poor ? 0 : 1));

        var test = DeLong.PairedTest(cells);

        Close.Relative(2.208984, test.Z, 1e-6);
        Close.Relative(0.02717578, test.PValue, 1e-6);
    }

    [Fact]
    public void PairedTest_GermanScores_MatchesPRocZPIntervalAndCovariance()
    {
        // R 4.2.2, pROC 1.18.0: roc.test(paired=TRUE), cov(method='delong') (REFERENCE.md §3)
        var cells = ReferenceData.German
            .GroupBy(row => (row.ScoreA, row.ScoreB))
            .Select(group => new PairedScoreCount(group.Key.ScoreA, group.Key.ScoreB, group.LongCount(row => !row.Bad), group.LongCount(row => row.Bad)));

        var test = DeLong.PairedTest(cells);

        Close.Relative(ReferenceData.R("german.test_a_vs_b.Z"), test.Z);
        Close.Relative(ReferenceData.R("german.test_a_vs_b.p"), test.PValue);
        Close.Relative(ReferenceData.R("german.test_a_vs_b.diff_ci_lower"), test.DifferenceConfidenceInterval?.Lower);
        Close.Relative(ReferenceData.R("german.test_a_vs_b.diff_ci_upper"), test.DifferenceConfidenceInterval?.Upper);
        Close.Relative(ReferenceData.R("german.cov_a_b_delong"), test.Covariance);
        Close.Relative(ReferenceData.R("german.score_a.auc"), test.AucA);
        Close.Relative(ReferenceData.R("german.score_b.auc"), test.AucB);
        Assert.Equal(700, test.Goods);
        Assert.Equal(300, test.Bads);
    }

    [Fact]
    public void PairedTest_OneCellPerApplication_EqualsAggregatedCells()
    {
        // Law: the sums are linear in the counts, so aggregation does not change the test (Sun & Xu 2014)
        var single = DeLong.PairedTest(ReferenceData.German.Reverse().Select(row => new PairedScoreCount(row.ScoreA, row.ScoreB, row.Bad ? 0 : 1, row.Bad ? 1 : 0)));
        var aggregated = DeLong.PairedTest(ReferenceData.German
            .GroupBy(row => (row.ScoreA, row.ScoreB))
            .Select(group => new PairedScoreCount(group.Key.ScoreA, group.Key.ScoreB, group.LongCount(row => !row.Bad), group.LongCount(row => row.Bad))));

        Close.Relative(aggregated.Z!.Value, single.Z, 1e-12);
        Close.Relative(aggregated.Covariance!.Value, single.Covariance, 1e-12);
    }

    [Fact]
    public void PairedTest_ScoreAgainstItself_ReturnsNullZWithReason()
    {
        // Law: Var(A − A) = 0, so z is undefined (DeLong et al. 1988)
        var cells = ReferenceData.German.Select(row => new PairedScoreCount(row.ScoreA, row.ScoreA, row.Bad ? 0 : 1, row.Bad ? 1 : 0));

        var test = DeLong.PairedTest(cells);

        Assert.Equal(0.0, test.Difference);
        Assert.Null(test.Z);
        Assert.Null(test.PValue);
        Assert.Null(test.DifferenceConfidenceInterval);
        Assert.NotNull(test.Reason);
        Close.Relative(test.VarianceA!.Value, test.Covariance, 1e-12);
    }

    [Fact]
    public void PairedTest_OnlyBads_ReturnsNullAucsWithReason()
    {
        // Edge case by definition: AUC needs both classes (common practice)
        var test = DeLong.PairedTest([new PairedScoreCount(500, 510, 0, 4), new PairedScoreCount(520, 505, 0, 2)]);

        Assert.Null(test.AucA);
        Assert.Null(test.Z);
        Assert.NotNull(test.Reason);
    }

    [Fact]
    public void UnpairedTest_AsahHalves_MatchesPRocStudentTTest()
    {
        // R 4.2.2, pROC 1.18.0: roc.test(method='delong', paired=FALSE), t with Welch-type df (REFERENCE.md §2)
        var first = Roc.Compute(ReferenceData.AsahHistogram(ReferenceData.Asah.Take(56), row => row.S100b));
        var second = Roc.Compute(ReferenceData.AsahHistogram(ReferenceData.Asah.Skip(56), row => row.S100b));

        var test = DeLong.UnpairedTest(first, second);

        Close.Relative(ReferenceData.R("asah.unpaired_halves.auc1_rows1to56"), test.AucA);
        Close.Relative(ReferenceData.R("asah.unpaired_halves.auc2_rows57to113"), test.AucB);
        Close.Relative(ReferenceData.R("asah.unpaired_halves.var1_delong"), first.Variance);
        Close.Relative(ReferenceData.R("asah.unpaired_halves.var2_delong"), second.Variance);
        Close.Relative(ReferenceData.R("asah.unpaired_halves.D"), test.Statistic);
        Close.Relative(ReferenceData.R("asah.unpaired_halves.df"), test.DegreesOfFreedom);
        Close.Relative(ReferenceData.R("asah.unpaired_halves.p"), test.PValue);
    }

    [Fact]
    public void UnpairedTest_CurveWithoutVariance_ReturnsNullStatisticWithReason()
    {
        // DeLong variance needs two goods and two bads (DeLong et al. 1988)
        var tiny = Roc.Compute(new ScoreHistogram([new ScoreCount(600, 1, 0), new ScoreCount(500, 0, 1)]));
        var full = Roc.Compute(ReferenceData.GermanHistogram(row => row.ScoreA));

        var test = DeLong.UnpairedTest(tiny, full);

        Assert.Null(test.Statistic);
        Assert.Null(test.PValue);
        Assert.NotNull(test.Reason);
    }
}
