using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;
using Ledgerline.Scoring.Tests.Scorecards;

namespace Ledgerline.Scoring.Tests.Engine;

public sealed class ReasonCodeTests
{
    // Four characteristics whose best points are 50, 40, 30, 20.
    private static ScorecardDefinition Table(int reasons) => new(null, 0m, Tables.Textbook, reasons,
    [
        Tables.Numeric("a", "RA", (null, 1m, 10m), (1m, null, 50m)),
        Tables.Numeric("b", "RB", (null, 1m, 0m), (1m, null, 40m)),
        Tables.Numeric("c", "RC", (null, 1m, 10m), (1m, null, 30m)),
        Tables.Numeric("d", "RD", (null, 1m, 0m), (1m, null, 20m)),
    ], Tables.Bands(100m, 50m));

    private static ReasonCode[] Reasons(int limit, params int[] values)
    {
        var scorecard = CompiledScorecard.Compile(Table(limit));
        return scorecard.Score(values.Select(v => ScoringValue.Of(v)).ToArray(), out _)!.ReasonCodes;
    }

    [Fact]
    public void ReasonCodes_LossesDiffer_RankedByPointsBelowMaximumDescending()
    {
        // Losses: a 40, b 40, c 20, d 20 — ties keep characteristic order.
        var reasons = Reasons(4, 0, 0, 0, 0);

        Assert.Equal(["RA", "RB", "RC", "RD"], reasons.Select(r => r.Code));
        Assert.Equal([40m, 40m, 20m, 20m], reasons.Select(r => r.PointsBelowMax));
    }

    [Fact]
    public void ReasonCodes_TieBetweenLaterAndEarlierCharacteristic_EarlierFirst()
    {
        // Losses: a 0, b 40, c 20, d 20: c before d on the tie.
        var reasons = Reasons(4, 1, 0, 0, 0);

        Assert.Equal(["RB", "RC", "RD"], reasons.Select(r => r.Code));
    }

    [Fact]
    public void ReasonCodes_CharacteristicAtItsMaximum_NeverListed()
    {
        var reasons = Reasons(4, 1, 1, 1, 1);

        Assert.Empty(reasons);
    }

    [Fact]
    public void ReasonCodes_MoreLossesThanLimit_KeepsTheLargest()
    {
        // Losses: a 40, b 40, c 20, d 20 with a limit of 3 — d loses the tie to c.
        var reasons = Reasons(3, 0, 0, 0, 0);

        Assert.Equal(["RA", "RB", "RC"], reasons.Select(r => r.Code));
    }

    [Fact]
    public void ReasonCodes_LimitZero_ReturnsNone() => Assert.Empty(Reasons(0, 0, 0, 0, 0));

    [Fact]
    public void ReasonCodes_LargestLossLast_StillRankedFirst()
    {
        var table = new ScorecardDefinition(null, 0m, Tables.Textbook, 2,
        [
            Tables.Numeric("a", "RA", (null, 1m, 45m), (1m, null, 50m)),
            Tables.Numeric("b", "RB", (null, 1m, 30m), (1m, null, 40m)),
            Tables.Numeric("c", "RC", (null, 1m, 0m), (1m, null, 90m)),
        ], Tables.Bands(100m, 50m));
        var reasons = CompiledScorecard.Compile(table).Score([ScoringValue.Of(0m), ScoringValue.Of(0m), ScoringValue.Of(0m)], out _)!.ReasonCodes;

        Assert.Equal(["RC", "RB"], reasons.Select(r => r.Code));
        Assert.Equal([90m, 10m], reasons.Select(r => r.PointsBelowMax));
    }

    [Fact]
    public void ReasonCodes_WorkedPointsExample_OnlyTheCharacteristicBelowItsMaximum()
    {
        // methods.md §3.2–3.3 check values (computed with R; illustrative numbers): points char1 =
        // (270.459, 288.637, 304.218), char2 = (273.344, 295.562); the applicant has char1 attribute 1
        // and char2 attribute 2: score 566.021, char1 shortfall 33.759, char2 none.
        var table = new ScorecardDefinition(null, 0m, Tables.Textbook, 4,
        [
            Tables.Categorical("char1", "C1", (["1"], 270.459m), (["2"], 288.637m), (["3"], 304.218m)),
            Tables.Categorical("char2", "C2", (["1"], 273.344m), (["2"], 295.562m)),
        ], Tables.Bands(600m, 500m));
        var result = CompiledScorecard.Compile(table).Score([ScoringValue.Of("1"), ScoringValue.Of("2")], out _)!;

        Assert.Equal(566.021m, result.Score);
        var reason = Assert.Single(result.ReasonCodes);
        Assert.Equal("C1", reason.Code);
        Assert.Equal(33.759m, reason.PointsBelowMax);
    }

    [Fact]
    public void ReasonCodes_MissingPointsAboveEveryBin_CountAsTheMaximum()
    {
        var table = new ScorecardDefinition(null, 0m, Tables.Textbook, 4,
            [Tables.Numeric("a", "RA", (null, 1m, 10m), (1m, null, 20m)) with { MissingPoints = 25m }], Tables.Bands(100m, 50m));
        var result = CompiledScorecard.Compile(table).Score([ScoringValue.Of(5m)], out _)!;

        Assert.Equal(5m, Assert.Single(result.ReasonCodes).PointsBelowMax);
    }
}
