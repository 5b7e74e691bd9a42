using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class KolmogorovSmirnovTests
{
    [Fact]
    public void Compute_GermanScoreA_MatchesScipyAndReportsSmallestPeakScore()
    {
        // scipy 1.10.1 ks_2samp; R 4.2.2 ecdf(): D = 0.2042857143, max at 562 and 563 (REFERENCE.md §3)
        var result = KolmogorovSmirnov.Compute(ReferenceData.GermanHistogram(row => row.ScoreA));

        Close.Relative(ReferenceData.Python("german.score_a.ks"), result.Statistic);
        Assert.Equal(562.0, result.Score);
        var peak = result.Points.Single(point => point.Score == 562);
        Close.Relative(216.0 / 300, peak.CumulativeBadShare, 1e-12);
        Close.Relative(361.0 / 700, peak.CumulativeGoodShare, 1e-12);
    }

    [Fact]
    public void Compute_GermanScoreB_MatchesScipy()
    {
        // scipy 1.10.1 ks_2samp, statistic_location 565 (REFERENCE.md §3)
        var result = KolmogorovSmirnov.Compute(ReferenceData.GermanHistogram(row => row.ScoreB));

        Close.Relative(ReferenceData.Python("german.score_b.ks"), result.Statistic);
        Assert.Equal(565.0, result.Score);
    }

    [Fact]
    public void Compute_AsahS100b_MatchesScipyStatisticAndLocation()
    {
        // scipy 1.10.1 ks_2samp(s100b of Poor, s100b of Good): D = 0.439701897 at 0.19 (REFERENCE.md §2)
        var result = KolmogorovSmirnov.Compute(ReferenceData.AsahHistogram(ReferenceData.Asah, row => row.S100b));

        Close.Relative(ReferenceData.Python("asah.ks.statistic"), result.Statistic);
        Assert.Equal(0.19, result.Score);
    }

    [Fact]
    public void Compute_SmallTextbookExample_MatchesPublishedValue()
    {
        // methods.md §2.4 check value computed with R 4.2.2: KS = 0.633333
        var histogram = RocTests.Histogram([620, 640, 655, 660, 670, 680, 690, 700, 710, 720], [580, 600, 610, 630, 650, 665]);

        Close.Relative(0.633333, KolmogorovSmirnov.Compute(histogram).Statistic, 1e-6);
    }

    [Fact]
    public void Compute_OnlyGoods_ReturnsNullWithReason()
    {
        // Edge case by definition (common practice)
        var result = KolmogorovSmirnov.Compute(new ScoreHistogram([new ScoreCount(600, 3, 0)]));

        Assert.Null(result.Statistic);
        Assert.Null(result.Score);
        Assert.NotNull(result.Reason);
    }

    [Fact]
    public void Compute_SingleScore_GivesZero()
    {
        // Both distributions jump to 1 at the same score (common practice)
        var result = KolmogorovSmirnov.Compute(new ScoreHistogram([new ScoreCount(600, 3, 2)]));

        Assert.Equal(0.0, result.Statistic);
        Assert.Equal(600.0, result.Score);
    }
}
