using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Scorecards;

public sealed class TryVersionTests
{
    private static async Task<(LedgerlineApp App, HttpClient Analyst)> StartAsync()
    {
        var app = new LedgerlineApp();
        var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        return (app, analyst);
    }

    private static Task<HttpResponseMessage> TryAsync(HttpClient client, string characteristicsJson) =>
        client.PostAsync($"/scorecards/{Scenario.Key}/versions/1/score", Scenario.Json($"{{\"characteristics\":{characteristicsJson}}}"));

    [Fact]
    public async Task Score_ContractExample_GivesPointsBinsAndReasonCodes()
    {
        var (app, analyst) = await StartAsync();
        await using var hosted = app;

        var response = await TryAsync(analyst, """{ "monthsAtAddress": 30, "residentialStatus": "tenant" }""");

        var body = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(response.IsSuccessStatusCode, body.ToString());
        Assert.Equal(100m, body.GetProperty("score").GetDecimal()); // 52 + 48
        Assert.Equal("refer", body.GetProperty("decision").GetString());
        // 600 at 50:1, PDO 20: odds(100) = 50 · 2^((100 − 600) / 20) (textbook scaling, recomputed).
        Assert.Equal(1 / (1 + (50 * Math.Pow(2, -25))), body.GetProperty("probabilityOfBad").GetDouble(), 12);
        var reasons = body.GetProperty("reasonCodes");
        Assert.Equal("A02", reasons[0].GetProperty("code").GetString()); // 70 − 48 = 22
        Assert.Equal(22m, reasons[0].GetProperty("pointsBelowMax").GetDecimal());
        Assert.Equal("A01", reasons[1].GetProperty("code").GetString()); // 71 − 52 = 19
        Assert.Equal(19m, reasons[1].GetProperty("pointsBelowMax").GetDecimal());
        Assert.Equal(1, body.GetProperty("characteristics")[0].GetProperty("bin").GetInt32());
    }

    [Theory]
    [InlineData("""{ "monthsAtAddress": 30, "residentialStatus": "tenant", "cardUtilisation": 0.4 }""", "characteristics.cardUtilisation", "no characteristic 'cardUtilisation'")]
    [InlineData("""{ "monthsAtAddress": "thirty", "residentialStatus": "tenant" }""", "characteristics.monthsAtAddress", "send a number")]
    [InlineData("""{ "monthsAtAddress": true, "residentialStatus": "tenant" }""", "characteristics.monthsAtAddress", "JSON true")]
    [InlineData("""{ "monthsAtAddress": 30 }""", "characteristics.residentialStatus", "missingPoints")]
    public async Task Score_BadInput_Answers400NamingTheCharacteristic(string characteristics, string path, string mention)
    {
        var (app, analyst) = await StartAsync();
        await using var hosted = app;

        var response = await TryAsync(analyst, characteristics);

        var problem = await response.AssertProblemAsync(HttpStatusCode.BadRequest, mention);
        Assert.True(problem.GetProperty("errors").TryGetProperty(path, out _), problem.ToString());
    }

    [Fact]
    public async Task Score_UnlistedCategoryWithoutOtherPoints_Answers400ListingTheCategories()
    {
        var (app, analyst) = await StartAsync();
        await using var hosted = app;
        var version = Scenario.Version();
        version["characteristics"]![1]!.AsObject().Remove("otherPoints");
        await Scenario.RegisterAsync(analyst, version);

        var response = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions/2/score",
            Scenario.Json("""{"characteristics":{ "monthsAtAddress": 30, "residentialStatus": "houseboat" }}"""));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "'houseboat'", "'tenant'");
    }

    [Fact]
    public async Task Score_NoCharacteristicsObject_Answers400()
    {
        var (app, analyst) = await StartAsync();
        await using var hosted = app;

        var response = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions/1/score", Scenario.Json("{}"));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "characteristics");
    }
}
