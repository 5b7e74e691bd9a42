using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class PowerTests
{
    [Fact]
    public void TwoProportionsSampleSize_FivePercentVersusSix_MatchesFleiss()
    {
        // methods.md §2.9 check values computed with R 4.2.2 power.prop.test: n = 8157.731448; continuity corrected 8356.53
        var size = Power.TwoProportionsSampleSize(0.05, 0.06);

        Close.Relative(8157.731448, size.PerArm, 1e-6);
        Close.Relative(8356.53, size.PerArmContinuityCorrected, 1e-6);
    }

    [Fact]
    public void HanleyMcNeilStandardError_Auc075With250Bads_MatchesCheckValue()
    {
        // methods.md §2.9 check value (Hanley & McNeil 1982 formula): SE = 0.018149
        Close.Relative(0.018149, Power.HanleyMcNeilStandardError(0.75, 250, 4750), 1e-5);
    }

    [Fact]
    public void AucDifferenceSampleSize_075Versus078AtFivePercentBadRate_MatchesCheckValue()
    {
        // methods.md §2.9 check value computed with R 4.2.2 (Hanley–McNeil SEs, independent arms): 27,761 per arm
        Assert.Equal(27761, Power.AucDifferenceSampleSize(0.75, 0.78, 0.05));
    }

    [Fact]
    public void MinimumDetectableBadRateDifference_AtFleissSampleSize_RecoversOnePoint()
    {
        // Inverse of the Fleiss formula (Fleiss 1981): with n = 8157.73 per arm the detectable step from 5% is 1 point
        var delta = Power.MinimumDetectableBadRateDifference(0.05, 8157.731448);

        Close.Relative(0.01, delta, 1e-6);
    }

    [Fact]
    public void MinimumDetectableAucDifference_AtRequiredSampleSize_IsAtMostThreePoints()
    {
        // Inverse of the Hanley–McNeil sample size (Hanley & McNeil 1982): 27,761 per arm detects 0.75 → 0.78
        var atSize = Power.MinimumDetectableAucDifference(0.75, 27761, 0.05);
        var belowSize = Power.MinimumDetectableAucDifference(0.75, 27760, 0.05);

        Assert.NotNull(atSize);
        Assert.True(atSize <= 0.03);
        Assert.True(belowSize > 0.03);
    }

    [Fact]
    public void MinimumDetectableBadRateDifference_TinySample_ReturnsNull()
    {
        // Not even a jump to a bad rate near 1 is detectable with two accounts per arm (Fleiss 1981)
        Assert.Null(Power.MinimumDetectableBadRateDifference(0.5, 2));
    }
}
