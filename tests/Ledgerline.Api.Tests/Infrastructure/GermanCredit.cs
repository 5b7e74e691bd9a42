using System.Globalization;
using System.Text.Json.Nodes;

namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>
/// The points table over the Statlog (German Credit) sample (Hofmann, University of Hamburg; as
/// shipped in R caret 6.0-93) and its 1,000 applications with outcomes and independently
/// computed expected scores (tests/reference/german-credit-scorecard.md).
/// </summary>
public static class GermanCredit
{
    public sealed record Application(int Row, JsonObject Characteristics, bool Bad, decimal ExpectedScore);

    public static JsonObject Version() =>
        JsonNode.Parse(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "reference", "german-credit-scorecard.json")))!.AsObject();

    public static IReadOnlyList<Application> Applications()
    {
        var lines = File.ReadAllLines(Path.Combine(AppContext.BaseDirectory, "reference", "german-credit-applications.csv"));
        var header = lines[0].Split(',');
        return lines.Skip(1).Select(line =>
        {
            var f = line.Split(',');
            string Field(string name) => f[Array.IndexOf(header, name)];
            var characteristics = new JsonObject
            {
                ["duration"] = decimal.Parse(Field("duration"), CultureInfo.InvariantCulture),
                ["amount"] = decimal.Parse(Field("amount"), CultureInfo.InvariantCulture),
                ["checkingAccount"] = Field("checkingAccount"),
                ["creditHistory"] = Field("creditHistory"),
                ["installmentRate"] = decimal.Parse(Field("installmentRate"), CultureInfo.InvariantCulture),
            };
            return new Application(int.Parse(Field("row"), CultureInfo.InvariantCulture), characteristics, Field("bad") == "true",
                decimal.Parse(Field("expectedScore"), CultureInfo.InvariantCulture));
        }).ToList();
    }

    /// <summary>The baseline request: every application with its outcome.</summary>
    public static JsonObject Baseline() => new()
    {
        ["records"] = new JsonArray(Applications()
            .Select(a => (JsonNode)new JsonObject { ["characteristics"] = a.Characteristics.DeepClone(), ["bad"] = a.Bad }).ToArray()),
    };
}
