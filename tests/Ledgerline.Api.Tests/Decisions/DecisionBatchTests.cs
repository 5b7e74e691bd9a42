using System.Net;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Decisions;

public sealed class DecisionBatchTests
{
    [Fact]
    public async Task DecideBatch_BadItems_NamedByIndexGoodItemsDecided()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var typo = LiveScoringSetup.Application("APP-2");
        typo["characteristics"]!["residentalStatus"] = "owner";
        var body = Batch(LiveScoringSetup.Application("APP-1"), typo, LiveScoringSetup.Application(""), LiveScoringSetup.Application("APP-4"), LiveScoringSetup.Application("APP-1"));

        var response = await setup.Scoring.PostAsync($"{LiveScoringSetup.DecisionsPath}/batch", Scenario.Json(body));
        var answer = await LiveScoringSetup.BodyAsync(response);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var statuses = answer.GetProperty("results").EnumerateArray().Select(r => r.GetProperty("status").GetInt32()).ToArray();
        Assert.Equal([201, 400, 400, 201, 200], statuses);
        Assert.Contains("applications[1].characteristics.residentalStatus", answer.GetProperty("results")[1].GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Contains("applications[2].applicationId", answer.GetProperty("results")[2].GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Equal(2, answer.GetProperty("decided").GetInt32());
        Assert.Equal(2, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task DecideBatch_OverLimit_Answers400AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var body = Batch(Enumerable.Range(0, 1001).Select(i => LiveScoringSetup.Application($"APP-{i}")).ToArray());

        var response = await setup.Scoring.PostAsync($"{LiveScoringSetup.DecisionsPath}/batch", Scenario.Json(body));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "applications", "1001", "1 to 1000");
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task DecideBatch_Thousand_AllDecidedInOneAnswer()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var body = Batch(Enumerable.Range(0, 1000).Select(i => LiveScoringSetup.Application($"APP-{i}", monthsAtAddress: i % 70)).ToArray());

        var response = await setup.Scoring.PostAsync($"{LiveScoringSetup.DecisionsPath}/batch", Scenario.Json(body));
        var answer = await LiveScoringSetup.BodyAsync(response);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal(1000, answer.GetProperty("decided").GetInt32());
        Assert.Equal(1000, app.CountRows("Decisions"));
        Assert.Equal(3000, app.CountRows("DecisionScores"));
    }

    private static JsonObject Batch(params JsonObject[] items) => new() { ["applications"] = new JsonArray(items) };
}
