using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class ProportionsTests
{
    [Fact]
    public void TwoProportionZTest_HandComputedExample_MatchesFormula()
    {
        // Pooled formula (common practice), values computed with Python 3.11 math.erfc: 120/1000 vs 90/1000,
        // pooled 0.105, z = 0.03 / sqrt(0.105·0.895·0.002) = 2.188265885, p = erfc(z/√2) = 0.0286502404
        var test = Proportions.TwoProportionZTest(120, 1000, 90, 1000);

        var z = 0.03 / Math.Sqrt(0.105 * 0.895 * 0.002);
        Close.Relative(z, test.Z, 1e-12);
        Close.Relative(2.188265885, test.Z, 1e-9);
        Close.Relative(0.0286502404, test.PValue, 1e-8);
        Close.Relative(0.03, test.Difference, 1e-12);
    }

    [Fact]
    public void TwoProportionZTest_SquaredZ_EqualsPearsonChiSquareOfTwoByTwoTable()
    {
        // Law: z² of the pooled test equals Pearson's chi-square without continuity correction (common practice)
        var test = Proportions.TwoProportionZTest(45, 300, 70, 350);
        double[,] observed = { { 45, 255 }, { 70, 280 } };
        double total = 650;
        double chiSquare = 0;
        for (var i = 0; i < 2; i++)
        {
            for (var j = 0; j < 2; j++)
            {
                var expected = (observed[i, 0] + observed[i, 1]) * (observed[0, j] + observed[1, j]) / total;
                chiSquare += (observed[i, j] - expected) * (observed[i, j] - expected) / expected;
            }
        }

        Close.Relative(chiSquare, test.Z!.Value * test.Z.Value, 1e-12);
    }

    [Fact]
    public void TwoProportionZTest_NoSuccessesAnywhere_ReturnsNullZWithReason()
    {
        // Zero pooled variance: z undefined (common practice)
        var test = Proportions.TwoProportionZTest(0, 100, 0, 200);

        Assert.Null(test.Z);
        Assert.Null(test.PValue);
        Assert.NotNull(test.Reason);
    }

    [Fact]
    public void TwoProportionZTest_EmptyGroup_ReturnsNullWithReason()
    {
        // Edge case by definition (common practice)
        var test = Proportions.TwoProportionZTest(0, 0, 5, 10);

        Assert.Null(test.Proportion1);
        Assert.Null(test.Z);
        Assert.NotNull(test.Reason);
    }

    [Fact]
    public void ChiSquareGoodnessOfFit_TwoCategories_EqualsSquaredZOfBinomialSplit()
    {
        // Law: with two categories χ² = z², so p = 2Φ(−√χ²) (common practice); 5,150 vs 4,850 against 50/50:
        // χ² = 2·150²/5000 = 9, p = 2Φ(−3) = 0.00269979606 (Python 3.11 math.erfc(3/√2))
        var test = Proportions.ChiSquareGoodnessOfFit([5150, 4850], [0.5, 0.5]);

        Close.Relative(9.0, test.Statistic, 1e-12);
        Assert.Equal(1, test.DegreesOfFreedom);
        Close.Relative(0.00269979606, test.PValue, 1e-8);
    }

    [Fact]
    public void ChiSquareGoodnessOfFit_ExactSplit_GivesZeroAndPOne()
    {
        // Law: observed equal to expected gives χ² = 0 (common practice)
        var test = Proportions.ChiSquareGoodnessOfFit([800, 100, 100], [0.8, 0.1, 0.1]);

        Assert.Equal(0.0, test.Statistic!.Value, 12);
        Assert.Equal(1.0, test.PValue!.Value, 12);
    }

    [Fact]
    public void ChiSquareGoodnessOfFit_ObservationsInUnplannedCategory_ReturnsNullWithReason()
    {
        // The statistic is infinite when E = 0 and O > 0 (Pearson 1900)
        var test = Proportions.ChiSquareGoodnessOfFit([90, 10], [1.0, 0.0]);

        Assert.Null(test.Statistic);
        Assert.NotNull(test.Reason);
    }

    [Fact]
    public void ChiSquareUpperTail_NineDegreesAtCriticalValue_IsFivePercent()
    {
        // methods.md §2.6 check value computed with R 4.2.2 qchisq: χ²₀.₉₅,₉ = 16.918978
        long[] observed = [1000, 0, 0, 0, 0, 0, 0, 0, 0, 0];
        var shares = Enumerable.Repeat(0.1, 10).ToArray();
        Assert.Equal(9, Proportions.ChiSquareGoodnessOfFit(observed, shares).DegreesOfFreedom);
        Close.Relative(0.05, MathNet.Numerics.SpecialFunctions.GammaUpperRegularized(4.5, 16.918978 / 2), 1e-6);
    }
}
