using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Tests.Engine;

public sealed class PointsScalingTests
{
    [Fact]
    public void Scaling_600At50To1With20ToDouble_GivesTextbookFactorAndOffset()
    {
        // Textbook scaling example (Siddiqi, "Credit Risk Scorecards", Wiley 2006): 600 points at
        // 50:1 good:bad with 20 points to double the odds -> factor 28.8539, offset 487.1229
        // (figures recomputed from factor = PDO / ln 2, offset = 600 - factor * ln 50).
        var scaling = new PointsScaling(new Scaling(600m, 50m, 20m));

        Assert.Equal(28.8539, scaling.Factor, 4);
        Assert.Equal(487.1229, scaling.Offset, 4);
        Assert.Equal(28.85390082, scaling.Factor, 8);
        Assert.Equal(487.1228762, scaling.Offset, 7);
    }

    [Theory]
    // Same source: odds 25 at 580, 50 at 600, 100 at 620 (each 20 points doubles the odds).
    [InlineData(580, 25)]
    [InlineData(600, 50)]
    [InlineData(620, 100)]
    public void Odds_AtAnchorAndOnePdoEitherSide_HalvesAndDoubles(int score, double odds)
    {
        var scaling = new PointsScaling(new Scaling(600m, 50m, 20m));

        Assert.Equal(odds, scaling.Odds(score), 9);
        Assert.Equal(1 / (1 + odds), scaling.ProbabilityOfBad(score), 12);
    }

    [Fact]
    public void ProbabilityOfBad_WorkedPointsExample_MatchesMethodsCheckValue()
    {
        // methods.md §3.2 check value (computed with R): score 566.021 under 600 at 50:1, PDO 20
        // gives P(bad) = 0.060974.
        var scaling = new PointsScaling(new Scaling(600m, 50m, 20m));

        Assert.Equal(0.060974, scaling.ProbabilityOfBad(566.021m), 6);
    }
}
