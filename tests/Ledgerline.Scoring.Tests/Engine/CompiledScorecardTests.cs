using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;
using Ledgerline.Scoring.Tests.Scorecards;

namespace Ledgerline.Scoring.Tests.Engine;

public sealed class CompiledScorecardTests
{
    private static readonly CompiledScorecard Contract = CompiledScorecard.Compile(Tables.Contract(basePoints: 10m));

    private static ScoreResult Score(CompiledScorecard scorecard, params ScoringValue[] values)
    {
        var result = scorecard.Score(values, out var failure);
        Assert.True(result is not null, failure?.Message);
        return result!;
    }

    [Theory]
    // Numeric bins are [from, upTo): a value equal to an upper edge belongs to the next bin.
    [InlineData("11.9999", 0, 38)]
    [InlineData("12", 1, 52)]
    [InlineData("47.9999", 1, 52)]
    [InlineData("48", 2, 71)]
    [InlineData("-1000", 0, 38)]
    [InlineData("1000000", 2, 71)]
    public void Score_NumericValueAtBinEdges_FallsInLeftClosedRightOpenBin(string value, int bin, int points)
    {
        var result = Score(Contract, ScoringValue.Of(decimal.Parse(value, System.Globalization.CultureInfo.InvariantCulture)), ScoringValue.Of("owner"));

        Assert.Equal(bin, result.MatchedBins[0]);
        Assert.Equal(points, result.Points[0]);
        Assert.Equal(10m + points + 70m, result.Score);
    }

    [Fact]
    public void Score_MissingValueWithMissingPoints_UsesMissingPoints()
    {
        var result = Score(Contract, ScoringValue.Missing, ScoringValue.Of("tenant"));

        Assert.Equal(MatchedBin.Missing, result.MatchedBins[0]);
        Assert.Equal(10m + 45m + 48m, result.Score);
    }

    [Fact]
    public void Score_UnlistedCategoryWithOtherPoints_UsesOtherPoints()
    {
        var result = Score(Contract, ScoringValue.Of(30m), ScoringValue.Of("houseboat"));

        Assert.Equal(MatchedBin.Other, result.MatchedBins[1]);
        Assert.Equal(48m, result.Points[1]);
    }

    [Fact]
    public void Score_MissingValueWithoutMissingPoints_FailsNamingTheCharacteristic()
    {
        var result = Contract.Score([ScoringValue.Of(30m), ScoringValue.Missing], out var failure);

        Assert.Null(result);
        Assert.Equal("residentialStatus", failure!.Characteristic);
        Assert.Contains("missingPoints", failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Score_UnlistedCategoryWithoutOtherPoints_FailsListingTheCategories()
    {
        var table = Tables.Contract() with
        {
            Characteristics = [Tables.Contract().Characteristics[0], Tables.Contract().Characteristics[1] with { OtherPoints = null }],
        };
        var result = CompiledScorecard.Compile(table).Score([ScoringValue.Of(30m), ScoringValue.Of("houseboat")], out var failure);

        Assert.Null(result);
        Assert.Contains("'houseboat'", failure!.Message, StringComparison.Ordinal);
        Assert.Contains("'tenant'", failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Score_TextForNumericCharacteristic_FailsAsWrongType()
    {
        var result = Contract.Score([ScoringValue.Of("thirty"), ScoringValue.Of("owner")], out var failure);

        Assert.Null(result);
        Assert.Equal("monthsAtAddress", failure!.Characteristic);
        Assert.Contains("numeric", failure.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Score_NumberForCategoricalCharacteristic_FailsAsWrongType()
    {
        var result = Contract.Score([ScoringValue.Of(30m), ScoringValue.Of(3m)], out var failure);

        Assert.Null(result);
        Assert.Equal("residentialStatus", failure!.Characteristic);
    }

    [Theory]
    // Bands are read top down: the first whose minScore the score reaches (120 approve, 100 refer).
    [InlineData("120", Band.Approve)]
    [InlineData("119.9999", Band.Refer)]
    [InlineData("100", Band.Refer)]
    [InlineData("99.9999", Band.Decline)]
    [InlineData("-5", Band.Decline)]
    public void BandFor_ScoreAroundCutOffs_TakesFirstBandReached(string score, Band expected) =>
        Assert.Equal(expected, Contract.BandFor(decimal.Parse(score, System.Globalization.CultureInfo.InvariantCulture)));

    [Fact]
    public void Score_SameInputTwice_GivesIdenticalExactScore()
    {
        var first = Score(Contract, ScoringValue.Of(30.5m), ScoringValue.Of("with-family"));
        var second = Score(Contract, ScoringValue.Of(30.5m), ScoringValue.Of("with-family"));

        Assert.Equal(first.Score, second.Score);
        Assert.Equal(first.ProbabilityOfBad, second.ProbabilityOfBad);
    }

    [Fact]
    public void Score_FractionalPoints_AddUpExactlyInDecimal()
    {
        // 0.1 + 0.2 is not 0.3 in binary floating point; points are exact decimals.
        var table = new ScorecardDefinition(null, 0.1m, Tables.Textbook, 4,
            [Tables.Numeric("a", "R1", (null, null, 0.2m))], Tables.Bands(1m, 0m));
        var result = Score(CompiledScorecard.Compile(table), ScoringValue.Of(1m));

        Assert.Equal(0.3m, result.Score);
    }

    [Fact]
    public void Compile_InvalidTable_ThrowsListingProblems()
    {
        var table = Tables.Contract() with { DecisionBands = [new DecisionBand(600m, Band.Approve)] };

        var error = Assert.Throws<ArgumentException>(() => CompiledScorecard.Compile(table));
        Assert.Contains("decisionBands[0].minScore", error.Message, StringComparison.Ordinal);
    }
}
