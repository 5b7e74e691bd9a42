using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class CalibrationTests
{
    // Scaling of REFERENCE.md §5: 600 points at 50:1 good:bad odds, 20 points to double the odds.
    private static readonly double Factor = 20 / Math.Log(2);
    private static readonly double Offset = 600 - (Factor * Math.Log(50));

    private static double ProbabilityOfBad(double score) => 1 / (1 + Math.Exp((score - Offset) / Factor));

    /// <summary>Ten groups of 100 rows: score descending, ties by row number ascending (REFERENCE.md §5 grouping rule).</summary>
    private static CalibrationCell[] ReferenceGroups() => ReferenceData.German
        .OrderByDescending(row => row.ScoreA).ThenBy(row => row.Row)
        .Select((row, position) => (row, group: position / 100))
        .GroupBy(item => item.group)
        .Select(group => new CalibrationCell(
            group.LongCount(),
            group.LongCount(item => item.row.Bad),
            group.Sum(item => ProbabilityOfBad(item.row.ScoreA))))
        .ToArray();

    [Fact]
    public void Assess_GermanScoreAGroups_MatchesJeffreysAndBinomialPValues()
    {
        // R 4.2.2 pbeta / binom.test and scipy 1.10.1 beta.cdf / binomtest(alternative='greater') (REFERENCE.md §5)
        var results = Calibration.Assess(ReferenceGroups());

        Assert.Equal(10, results.Count);
        for (var g = 0; g < 10; g++)
        {
            var key = $"cal.g{g + 1:00}";
            Assert.Equal(100, results[g].Count);
            Assert.Equal((long)ReferenceData.R($"{key}.defaults"), results[g].Bads);
            Close.Relative(ReferenceData.R($"{key}.mean_pd"), results[g].MeanProbabilityOfBad, 1e-12);
            Close.Relative(ReferenceData.R($"{key}.jeffreys_p"), results[g].JeffreysP, 1e-8);
            Close.Relative(ReferenceData.R($"{key}.binom_greater_p"), results[g].BinomialP, 1e-8);
        }

        Assert.Equal(TrafficLight.Red, results[0].Status);
        Assert.Equal(TrafficLight.Green, results[9].Status);
    }

    [Fact]
    public void HosmerLemeshow_GermanScoreAGroups_MatchesReferenceWithEightDegreesOfFreedom()
    {
        // numpy 1.24.2 and R 4.2.2 pchisq: HL = 529.7774252, p = 2.859306626e-109 (REFERENCE.md §5)
        var result = HosmerLemeshow.Compute(ReferenceGroups(), degreesOfFreedom: 8);

        Close.Relative(ReferenceData.R("cal.hl_chisq"), result.Statistic);
        Close.Relative(ReferenceData.R("cal.hl_p_df8"), result.PValue, 1e-8);
        Assert.Equal(10, result.Groups);
    }

    [Fact]
    public void HosmerLemeshow_PublishedExample_MatchesCheckValues()
    {
        // methods.md §2.7 check values computed with R 4.2.2: HL = 3.361907, p(df 5) = 0.644378, p(df 3) = 0.339119
        double[] pd = [0.01, 0.02, 0.04, 0.08, 0.16];
        long[] bads = [12, 18, 45, 70, 170];
        var groups = pd.Select((p, i) => new CalibrationCell(1000, bads[i], 1000 * p)).ToArray();

        var five = HosmerLemeshow.Compute(groups, 5);
        var three = HosmerLemeshow.Compute(groups, 3);

        Close.Relative(3.361907, five.Statistic, 1e-6);
        Close.Relative(0.644378, five.PValue, 1e-6);
        Close.Relative(0.339119, three.PValue, 1e-5);
    }

    [Fact]
    public void HosmerLemeshow_GroupWithZeroPd_ReturnsNullWithReason()
    {
        // The term divides by E·(1 − p̄), zero when p̄ = 0 (Hosmer & Lemeshow 1980)
        var result = HosmerLemeshow.Compute([new CalibrationCell(100, 1, 0), new CalibrationCell(100, 5, 5)], 2);

        Assert.Null(result.Statistic);
        Assert.Null(result.PValue);
        Assert.NotNull(result.Reason);
    }

    [Fact]
    public void BrierScore_GermanScoreAByDistinctScore_MatchesReference()
    {
        // numpy 1.24.2 and R 4.2.2: Brier = 0.2323209711 (REFERENCE.md §5); exact from groups sharing one PD
        var groups = ReferenceData.GermanHistogram(row => row.ScoreA).Counts
            .Select(count => new ProbabilityGroup(ProbabilityOfBad(count.Score), count.Total, count.Bads));

        Close.Relative(ReferenceData.R("cal.brier"), BrierScore.Compute(groups), 1e-12);
    }

    [Fact]
    public void BrierScore_PublishedExample_MatchesCheckValue()
    {
        // methods.md §2.7 check value: p = {0.1, 0.2, 0.3, 0.8}, y = {0, 0, 1, 1} → 0.145
        ProbabilityGroup[] groups = [new(0.1, 1, 0), new(0.2, 1, 0), new(0.3, 1, 1), new(0.8, 1, 1)];

        Close.Relative(0.145, BrierScore.Compute(groups), 1e-12);
    }

    [Fact]
    public void BrierScore_NoDecisions_IsNull()
    {
        // Edge case by definition (common practice)
        Assert.Null(BrierScore.Compute([]));
    }

    [Theory]
    [InlineData(200, 7, 0.025, 0.1778527)]
    [InlineData(5000, 130, 0.02, 0.0017871)]
    [InlineData(1000, 0, 0.001, 0.8428565)]
    public void JeffreysP_PublishedExamples_MatchCheckValues(long count, long bads, double pd, double expected)
    {
        // methods.md §2.7 check values computed with R 4.2.2 pbeta (ECB 2019 §2.5.3.1 formula); published to 5 digits
        Close.Relative(expected, Calibration.JeffreysP(count, bads, pd), 5e-5);
    }

    [Theory]
    [InlineData(200, 7, 0.025, 0.2359460)]
    [InlineData(5000, 130, 0.02, 0.0020710)]
    public void BinomialP_PublishedExamples_MatchCheckValues(long count, long bads, double pd, double expected)
    {
        // methods.md §2.7 check values computed with R 4.2.2 pbinom; published to 5 digits
        Close.Relative(expected, Calibration.BinomialP(count, bads, pd), 5e-5);
    }

    [Fact]
    public void Assess_EmptyGroup_IsNotAssessedWithReason()
    {
        // Edge case: no decisions, no test (common practice)
        var result = Calibration.Assess([new CalibrationCell(0, 0, 0)]).Single();

        Assert.Equal(TrafficLight.NotAssessed, result.Status);
        Assert.Null(result.JeffreysP);
        Assert.NotNull(result.Reason);
    }

    [Fact]
    public void CellsByScoreBand_GermanScoreA_SumsCountsBadsAndExpectedBads()
    {
        // Aggregation identity: band totals add up to the portfolio (common practice); mean PD 0.1305310381 (REFERENCE.md §5)
        var histogram = ReferenceData.GermanHistogram(row => row.ScoreA);

        var cells = Calibration.CellsByScoreBand(histogram, [520, 560], BinEdge.RightClosed, ProbabilityOfBad);

        Assert.Equal(3, cells.Count);
        Assert.Equal(1000, cells.Sum(cell => cell.Count));
        Assert.Equal(300, cells.Sum(cell => cell.Bads));
        Close.Relative(ReferenceData.R("cal.mean_pd"), cells.Sum(cell => cell.ExpectedBads) / 1000, 1e-12);
    }
}
