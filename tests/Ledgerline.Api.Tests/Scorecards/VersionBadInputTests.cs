using System.Net;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Scorecards;

/// <summary>Each broken points table gets a problem-details answer naming the field, and nothing is stored.</summary>
public sealed class VersionBadInputTests
{
    private static readonly Dictionary<string, Action<JsonObject>> Breakages = new()
    {
        ["gap between numeric bins"] = v => Bins(v, 0)[1]!["from"] = 13,
        ["overlap between numeric bins"] = v => Bins(v, 0)[1]!["from"] = 10,
        ["category in two bins"] = v => Bins(v, 1)[1]!["values"] = new JsonArray("tenant", "owner"),
        ["duplicate characteristic name"] = v => Characteristic(v, 1)["name"] = "monthsAtAddress",
        ["duplicate reason code"] = v => Characteristic(v, 1)["reasonCode"] = "A01",
        ["over-precise points"] = v => Bins(v, 0)[0]!["points"] = 38.00001m,
        ["bands out of order"] = v => v["decisionBands"]![1]!["minScore"] = 130,
        ["no catch-all band"] = v => v["decisionBands"]!.AsArray().RemoveAt(2),
        ["zero base odds"] = v => v["scaling"]!["baseOdds"] = 0,
        ["negative points to double"] = v => v["scaling"]!["pointsToDoubleOdds"] = -20,
        ["unknown characteristic type"] = v => Characteristic(v, 0)["type"] = "ordinal",
        ["bin without points"] = v => Bins(v, 0)[0]!.AsObject().Remove("points"),
        ["no characteristics"] = v => v["characteristics"] = new JsonArray(),
        ["unknown decision word"] = v => v["decisionBands"]![0]!["decision"] = "accept",
    };

    private static readonly Dictionary<string, string> ExpectedPath = new()
    {
        ["gap between numeric bins"] = "characteristics[0].bins[1].from",
        ["overlap between numeric bins"] = "characteristics[0].bins[1].from",
        ["category in two bins"] = "characteristics[1].bins[1].values[1]",
        ["duplicate characteristic name"] = "characteristics[1].name",
        ["duplicate reason code"] = "characteristics[1].reasonCode",
        ["over-precise points"] = "characteristics[0].bins[0].points",
        ["bands out of order"] = "decisionBands[1].minScore",
        ["no catch-all band"] = "decisionBands[1].minScore",
        ["zero base odds"] = "scaling.baseOdds",
        ["negative points to double"] = "scaling.pointsToDoubleOdds",
        ["unknown characteristic type"] = "characteristics[0].type",
        ["bin without points"] = "characteristics[0].bins[0].points",
        ["no characteristics"] = "characteristics",
        ["unknown decision word"] = "decisionBands[0].decision",
    };

    public static TheoryData<string> Cases() => [.. Breakages.Keys];

    [Theory]
    [MemberData(nameof(Cases))]
    public async Task RegisterVersion_BrokenTable_Answers400NamingTheFieldAndStoresNothing(string breakage)
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        var version = Scenario.Version();
        Breakages[breakage](version);

        var response = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(version));

        var problem = await response.AssertProblemAsync(HttpStatusCode.BadRequest);
        Assert.True(problem.GetProperty("errors").TryGetProperty(ExpectedPath[breakage], out var messages),
            $"expected an error at {ExpectedPath[breakage]}: {problem}");
        Assert.NotEqual(0, messages.GetArrayLength());
        Assert.Equal(0, app.CountRows("Versions"));
    }

    [Theory]
    [InlineData("{ \"basePoints\": 0, ", "Malformed JSON")]
    [InlineData("{ \"basePoints\": \"ten\" }", "'$.basePoints'")]
    [InlineData("{ \"basePoints\": 1e400 }", "'$.basePoints'")]
    [InlineData("{ \"basePoints\": NaN }", "Malformed JSON")]
    public async Task RegisterVersion_MalformedOrNonFiniteJson_Answers400SayingWhere(string body, string mention)
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);

        var response = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(body));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, mention);
        Assert.Equal(0, app.CountRows("Versions"));
    }

    [Fact]
    public async Task RegisterVersion_BodyOverTheLimit_Answers413AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        var version = Scenario.Version();
        version["description"] = new string('x', 9 * 1024 * 1024);

        // Expect: 100-continue lets the server refuse by the declared length before the body is sent.
        using var request = new HttpRequestMessage(HttpMethod.Post, $"/scorecards/{Scenario.Key}/versions") { Content = Scenario.Json(version) };
        request.Headers.ExpectContinue = true;
        var response = await analyst.SendAsync(request);

        await response.AssertProblemAsync(HttpStatusCode.RequestEntityTooLarge, "limit");
        Assert.Equal(0, app.CountRows("Versions"));
    }

    private static JsonObject Characteristic(JsonObject version, int index) => version["characteristics"]![index]!.AsObject();

    private static JsonArray Bins(JsonObject version, int index) => Characteristic(version, index)["bins"]!.AsArray();
}
