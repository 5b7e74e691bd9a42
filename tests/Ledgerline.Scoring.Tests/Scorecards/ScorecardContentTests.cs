using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Tests.Scorecards;

public sealed class ScorecardContentTests
{
    [Fact]
    public void Hash_TrailingZerosInNumbers_Unchanged()
    {
        var plain = Tables.Contract();
        var padded = plain with { BasePoints = 0.000m, Scaling = new Scaling(600.00m, 50.0m, 20.0000m) };

        Assert.Equal(ScorecardContent.Hash(plain), ScorecardContent.Hash(padded));
    }

    [Fact]
    public void Hash_CategoryOrderWithinBin_Unchanged()
    {
        var plain = Tables.Contract();
        var characteristics = plain.Characteristics.ToList();
        characteristics[1] = Tables.Categorical("residentialStatus", "A02", (["mortgage", "owner"], 70m), (["tenant"], 48m), (["with-family"], 55m)) with { OtherPoints = 48m };

        Assert.Equal(ScorecardContent.Hash(plain), ScorecardContent.Hash(plain with { Characteristics = characteristics }));
    }

    [Fact]
    public void Hash_AnyPointChanged_Differs()
    {
        var plain = Tables.Contract();
        var characteristics = plain.Characteristics.ToList();
        characteristics[0] = characteristics[0] with { MissingPoints = 44m };

        Assert.NotEqual(ScorecardContent.Hash(plain), ScorecardContent.Hash(plain with { Characteristics = characteristics }));
    }

    [Fact]
    public void Hash_CharacteristicOrderSwapped_Differs()
    {
        // Order breaks reason-code ties, so it is part of the content.
        var plain = Tables.Contract();

        Assert.NotEqual(ScorecardContent.Hash(plain), ScorecardContent.Hash(plain with { Characteristics = plain.Characteristics.Reverse().ToList() }));
    }

    [Fact]
    public void CanonicalJson_Contract_HasFixedKeyOrderAndPlainNumbers()
    {
        var json = System.Text.Encoding.UTF8.GetString(ScorecardContent.CanonicalJson(Tables.Contract() with { BasePoints = 5.50m }));

        Assert.StartsWith("{\"description\":\"contract example\",\"basePoints\":5.5,\"scaling\":{\"baseScore\":600,\"baseOdds\":50,\"pointsToDoubleOdds\":20}", json, StringComparison.Ordinal);
        Assert.Matches("^[0-9a-f]{64}$", ScorecardContent.Hash(Tables.Contract()));
    }
}
