using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Tests.Scorecards;

public sealed class ScorecardValidatorTests
{
    private static IReadOnlyList<FieldProblem> Check(ScorecardDefinition table) => ScorecardValidator.Validate(table);

    private static ScorecardDefinition WithFirst(CharacteristicDefinition characteristic)
    {
        var table = Tables.Contract();
        return table with { Characteristics = [characteristic, table.Characteristics[1]] };
    }

    [Fact]
    public void Validate_ContractExample_HasNoProblems() => Assert.Empty(Check(Tables.Contract()));

    [Fact]
    public void Validate_GapBetweenNumericBins_NamesTheBinAndTheExpectedEdge()
    {
        var problems = Check(WithFirst(Tables.Numeric("monthsAtAddress", "A01", (null, 12m, 38m), (13m, 48m, 52m), (48m, null, 71m))));

        var problem = Assert.Single(problems);
        Assert.Equal("characteristics[0].bins[1].from", problem.Path);
        Assert.Contains("a gap", problem.Message, StringComparison.Ordinal);
        Assert.Contains("must start at 12", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_OverlapBetweenNumericBins_Reported()
    {
        var problem = Assert.Single(Check(WithFirst(Tables.Numeric("monthsAtAddress", "A01", (null, 12m, 38m), (10m, 48m, 52m), (48m, null, 71m)))));

        Assert.Contains("an overlap", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_FirstBinWithLowerEdgeAndLastWithUpperEdge_BothReported()
    {
        var problems = Check(WithFirst(Tables.Numeric("monthsAtAddress", "A01", (0m, 12m, 38m), (12m, 48m, 71m))));

        Assert.Contains(problems, p => p.Path == "characteristics[0].bins[0].from");
        Assert.Contains(problems, p => p.Path == "characteristics[0].bins[1].upTo");
    }

    [Fact]
    public void Validate_CategoryInTwoBins_NamesTheValueAndBothBins()
    {
        var problem = Assert.Single(Check(Tables.Contract() with
        {
            Characteristics =
            [
                Tables.Contract().Characteristics[0],
                Tables.Categorical("residentialStatus", "A02", (["owner"], 70m), (["tenant", "owner"], 48m)),
            ],
        }));

        Assert.Equal("characteristics[1].bins[1].values[1]", problem.Path);
        Assert.Contains("'owner' is already in bins[0]", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_DuplicateNamesAndReasonCodes_BothReported()
    {
        var first = Tables.Contract().Characteristics[0];
        var problems = Check(Tables.Contract() with { Characteristics = [first, first with { Name = "MonthsAtAddress" }] });

        Assert.Contains(problems, p => p.Path == "characteristics[1].name");
        Assert.Contains(problems, p => p.Path == "characteristics[1].reasonCode");
    }

    [Fact]
    public void Validate_OverPrecisePoints_Reported()
    {
        var problem = Assert.Single(Check(Tables.Contract() with { BasePoints = 1.00001m }));

        Assert.Equal("basePoints", problem.Path);
        Assert.Contains("decimal places", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_BandsOutOfOrderAndWithoutCatchAll_Reported()
    {
        var problems = Check(Tables.Contract() with
        {
            DecisionBands = [new DecisionBand(500m, Band.Refer), new DecisionBand(600m, Band.Approve), new DecisionBand(400m, Band.Decline)],
        });

        Assert.Contains(problems, p => p.Path == "decisionBands[1].minScore" && p.Message.Contains("must fall", StringComparison.Ordinal));
        Assert.Contains(problems, p => p.Path == "decisionBands[2].minScore" && p.Message.Contains("last band", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(0, 20, "scaling.baseOdds")]
    [InlineData(-1, 20, "scaling.baseOdds")]
    [InlineData(50, 0, "scaling.pointsToDoubleOdds")]
    [InlineData(50, -20, "scaling.pointsToDoubleOdds")]
    public void Validate_NonPositiveOddsOrPointsToDouble_Reported(int odds, int pdo, string path)
    {
        var problem = Assert.Single(Check(Tables.Contract() with { Scaling = new Scaling(600m, odds, pdo) }));

        Assert.Equal(path, problem.Path);
    }

    [Fact]
    public void Validate_OtherPointsOnNumeric_Reported()
    {
        var problem = Assert.Single(Check(WithFirst(Tables.Contract().Characteristics[0] with { OtherPoints = 1m })));

        Assert.Equal("characteristics[0].otherPoints", problem.Path);
    }
}
