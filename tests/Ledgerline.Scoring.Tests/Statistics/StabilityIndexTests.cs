using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class StabilityIndexTests
{
    private static IEnumerable<double> Expected => ReferenceData.German.Take(500).Select(row => row.ScoreA);

    private static IEnumerable<double> Actual => ReferenceData.German.Skip(500).Select(row => row.ScoreA);

    [Fact]
    public void QuantileCutPoints_GermanScoreA_MatchRType7()
    {
        // R 4.2.2 quantile(type=7) and numpy 1.24.2 quantile(method='linear') (REFERENCE.md §4)
        var cuts = ScoreBinning.QuantileCutPoints(ReferenceData.Frequencies(Expected));

        Assert.Equal(9, cuts.Count);
        for (var k = 0; k < 9; k++)
        {
            Close.Relative(ReferenceData.R($"psi.cut{k + 1}"), cuts[k], 1e-12);
        }
    }

    [Theory]
    [InlineData(BinEdge.RightClosed, "right_closed")]
    [InlineData(BinEdge.LeftClosed, "left_closed")]
    public void Compute_UnshiftedGermanScoreA_MatchesReferenceCountsAndPsi(BinEdge edge, string name)
    {
        // R 4.2.2 findInterval and numpy 1.24.2 searchsorted, natural-log PSI (REFERENCE.md §4a, §4b)
        var cuts = ScoreBinning.QuantileCutPoints(ReferenceData.Frequencies(Expected));
        var expected = ScoreBinning.Assign(ReferenceData.Frequencies(Expected), cuts, edge);
        var actual = ScoreBinning.Assign(ReferenceData.Frequencies(Actual), cuts, edge);

        var result = StabilityIndex.Compute(expected, actual);

        Assert.Equal(ReferenceData.RCounts($"psi.unshifted.{name}.expected_counts"), expected);
        Assert.Equal(ReferenceData.RCounts($"psi.unshifted.{name}.actual_counts"), actual);
        Close.Relative(ReferenceData.R($"psi.unshifted.{name}.psi"), result.Value);
        Assert.False(result.Adjusted);
        Close.Relative(ReferenceData.Python($"psi.unshifted.{name}.psi_plus0.5_numpy"),
            StabilityIndex.Compute(expected, actual, EmptyBinRule.AddHalfCount).Value);
    }

    [Theory]
    [InlineData(BinEdge.RightClosed, "right_closed")]
    [InlineData(BinEdge.LeftClosed, "left_closed")]
    public void Compute_ShiftedGermanScoreA_IsInfiniteWithoutRuleAndMatchesBothRules(BinEdge edge, string name)
    {
        // numpy 1.24.2, actual shifted by −25 empties bins 7–10 (REFERENCE.md §4c, §4d)
        var cuts = ScoreBinning.QuantileCutPoints(ReferenceData.Frequencies(Expected));
        var expected = ScoreBinning.Assign(ReferenceData.Frequencies(Expected), cuts, edge);
        var actual = ScoreBinning.Assign(ReferenceData.Frequencies(Actual.Select(score => score - 25)), cuts, edge);

        var raw = StabilityIndex.Compute(expected, actual, EmptyBinRule.None);
        var floored = StabilityIndex.Compute(expected, actual, EmptyBinRule.FloorShares, 1e-4);
        var halfCount = StabilityIndex.Compute(expected, actual, EmptyBinRule.AddHalfCount);

        Assert.Equal(ReferenceData.RCounts($"psi.shifted.{name}.actual_counts"), actual);
        Assert.Equal(double.PositiveInfinity, ReferenceData.R($"psi.shifted.{name}.psi"));
        Assert.Null(raw.Value);
        Assert.NotNull(raw.Reason);
        Close.Relative(ReferenceData.Python($"psi.shifted.{name}.psi_eps1e-4_numpy"), floored.Value);
        Assert.True(floored.Adjusted);
        Close.Relative(ReferenceData.Python($"psi.shifted.{name}.psi_plus0.5_numpy"), halfCount.Value);
    }

    [Fact]
    public void Compute_ShiftedRightClosedFloor_MatchesPerBinContributions()
    {
        // numpy 1.24.2 (REFERENCE.md §4d table, bin 7: 0.9969947675, bin 10: 0.5959551357)
        var cuts = ScoreBinning.QuantileCutPoints(ReferenceData.Frequencies(Expected));
        var expected = ScoreBinning.Assign(ReferenceData.Frequencies(Expected), cuts, BinEdge.RightClosed);
        var actual = ScoreBinning.Assign(ReferenceData.Frequencies(Actual.Select(score => score - 25)), cuts, BinEdge.RightClosed);

        var result = StabilityIndex.Compute(expected, actual);

        Close.Relative(0.9969947675, result.Bins[6].Contribution, 1e-9);
        Close.Relative(0.5959551357, result.Bins[9].Contribution, 1e-9);
        Assert.Equal(1e-4, result.Bins[6].ActualShare);
    }

    [Fact]
    public void Compute_ShiftedByFive_MatchesReference()
    {
        // numpy 1.24.2, actual shifted by −5, no empty bins (REFERENCE.md §4e)
        var cuts = ScoreBinning.QuantileCutPoints(ReferenceData.Frequencies(Expected));
        var expected = ScoreBinning.Assign(ReferenceData.Frequencies(Expected), cuts, BinEdge.LeftClosed);
        var actual = ScoreBinning.Assign(ReferenceData.Frequencies(Actual.Select(score => score - 5)), cuts, BinEdge.LeftClosed);

        Close.Relative(ReferenceData.Python("psi.extra_shift5.left_closed.psi_raw_numpy"), StabilityIndex.Compute(expected, actual).Value);
    }

    [Fact]
    public void Compute_PublishedSmallShift_MatchesCheckValue()
    {
        // methods.md §2.6 check value computed with R 4.2.2: PSI = 0.008376
        long[] expected = [10, 10, 10, 10, 10, 10, 10, 10, 10, 10];
        long[] actual = [8, 9, 10, 10, 11, 11, 10, 11, 10, 10];

        Close.Relative(0.008376, StabilityIndex.Compute(expected, actual).Value, 1e-4);
    }

    [Fact]
    public void Compute_PublishedUnevenBins_MatchesCheckValue()
    {
        // methods.md §2.6 check value computed with R 4.2.2: PSI = 0.078431
        long[] expected = [5, 15, 30, 30, 15, 5];
        long[] actual = [10, 20, 30, 25, 10, 5];

        Close.Relative(0.078431, StabilityIndex.Compute(expected, actual).Value, 1e-5);
    }

    [Theory]
    [InlineData(EmptyBinRule.FloorShares)]
    [InlineData(EmptyBinRule.AddHalfCount)]
    [InlineData(EmptyBinRule.None)]
    public void Compute_IdenticalDistributions_IsZero(EmptyBinRule rule)
    {
        // Law: ln(a/e) = 0 when a = e, also with empty bins in both (common practice)
        long[] counts = [51, 49, 0, 40, 51, 50, 69, 41, 45, 44];

        Assert.Equal(0.0, StabilityIndex.Compute(counts, counts, rule).Value);
    }

    [Fact]
    public void Compute_ProportionalCounts_IsZero()
    {
        // Law: PSI depends on shares only (common practice)
        Assert.Equal(0.0, StabilityIndex.Compute([10, 20, 30], [100, 200, 300]).Value!.Value, 15);
    }

    [Fact]
    public void Compute_MismatchedBins_Throws()
    {
        // Programmer error: the bins must be the same (documented exception)
        Assert.Throws<ArgumentException>(() => StabilityIndex.Compute([1, 2], [1, 2, 3]));
    }
}
