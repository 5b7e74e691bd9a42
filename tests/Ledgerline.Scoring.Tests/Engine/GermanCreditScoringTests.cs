using System.Globalization;
using System.Text.Json;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Tests.Engine;

public sealed class GermanCreditScoringTests
{
    [Fact]
    public void Score_GermanCreditApplications_GiveIndependentlyComputedExpectedScores()
    {
        // tests/reference/german-credit-scorecard.json over the Statlog (German Credit) sample
        // (Hofmann, University of Hamburg; as shipped in R caret 6.0-93); expectedScore computed
        // independently in Python from the same JSON.
        using var document = JsonDocument.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "reference", "german-credit-scorecard.json")));
        var scorecard = CompiledScorecard.Compile(ReadTable(document.RootElement));
        var lines = File.ReadAllLines(Path.Combine(AppContext.BaseDirectory, "reference", "german-credit-applications.csv"));
        var header = lines[0].Split(',');
        var values = new ScoringValue[scorecard.CharacteristicCount];
        foreach (var line in lines.Skip(1))
        {
            var fields = line.Split(',');
            for (var i = 0; i < scorecard.CharacteristicCount; i++)
            {
                var name = scorecard.NameAt(i);
                var text = fields[Array.IndexOf(header, name)];
                values[i] = scorecard.Definition.Characteristics[i].Type == CharacteristicType.Numeric
                    ? ScoringValue.Of(decimal.Parse(text, CultureInfo.InvariantCulture))
                    : ScoringValue.Of(text);
            }

            var result = scorecard.Score(values, out var failure);
            Assert.True(result is not null, failure?.Message);
            Assert.Equal(decimal.Parse(fields[^1], CultureInfo.InvariantCulture), result.Score);
        }

        Assert.Equal(1001, lines.Length);
    }

    private static ScorecardDefinition ReadTable(JsonElement json)
    {
        static decimal? Number(JsonElement e, string name) => e.TryGetProperty(name, out var v) ? v.GetDecimal() : null;
        var scaling = json.GetProperty("scaling");
        return new ScorecardDefinition(
            json.GetProperty("description").GetString(),
            json.GetProperty("basePoints").GetDecimal(),
            new Scaling(scaling.GetProperty("baseScore").GetDecimal(), scaling.GetProperty("baseOdds").GetDecimal(), scaling.GetProperty("pointsToDoubleOdds").GetDecimal()),
            json.GetProperty("reasonCodeCount").GetInt32(),
            json.GetProperty("characteristics").EnumerateArray().Select(c => new CharacteristicDefinition(
                c.GetProperty("name").GetString()!,
                c.GetProperty("type").GetString() == "numeric" ? CharacteristicType.Numeric : CharacteristicType.Categorical,
                c.GetProperty("reasonCode").GetString()!,
                c.GetProperty("reasonText").GetString()!,
                c.GetProperty("bins").EnumerateArray().Select(b => new BinDefinition(
                    Number(b, "from"),
                    Number(b, "upTo"),
                    b.TryGetProperty("values", out var v) ? v.EnumerateArray().Select(x => x.GetString()!).ToList() : null,
                    b.GetProperty("points").GetDecimal())).ToList(),
                Number(c, "missingPoints"),
                Number(c, "otherPoints"))).ToList(),
            json.GetProperty("decisionBands").EnumerateArray().Select(b => new DecisionBand(
                Number(b, "minScore"),
                BandNames.TryParse(b.GetProperty("decision").GetString(), out var d) ? d : throw new InvalidDataException())).ToList());
    }
}
