using System.Net;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Decisions;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Traffic;

public sealed class TrafficPlanTests
{
    [Fact]
    public async Task ChangePlan_ApprovedVersions_StoresRevisionWithWhoWhenWhy()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app, 0.25m);

        var plan = await LiveScoringSetup.BodyAsync(await setup.Analyst.GetAsync(LiveScoringSetup.TrafficPath));

        Assert.Equal(1, plan.GetProperty("revision").GetInt32());
        Assert.Equal(1, plan.GetProperty("champion").GetInt32());
        Assert.Equal(0.75m, plan.GetProperty("championShare").GetDecimal());
        Assert.Equal(2, plan.GetProperty("challengers")[0].GetProperty("version").GetInt32());
        Assert.Equal(3, plan.GetProperty("shadows")[0].GetInt32());
        Assert.Equal("Challenger test of the 2026 rebuild", plan.GetProperty("reason").GetString());
        Assert.False(string.IsNullOrEmpty(plan.GetProperty("changedBy").GetString()));
        Assert.Equal(1, CountAudit(app, "traffic.changed"));
    }

    [Fact]
    public async Task ChangePlan_PromoteChallenger_NewRevisionInHistoryAndDecisionsUseIt()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var promoted = await setup.Risk.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(2, [], [1], "Rebuild beat the incumbent; promote it")));
        var decision = await LiveScoringSetup.BodyAsync(await setup.DecideAsync(LiveScoringSetup.Application("APP-1")));

        Assert.Equal(HttpStatusCode.OK, promoted.StatusCode);
        var history = await LiveScoringSetup.BodyAsync(await setup.Risk.GetAsync($"{LiveScoringSetup.TrafficPath}/history"));
        Assert.Equal([2, 1], history.GetProperty("revisions").EnumerateArray().Select(r => r.GetProperty("revision").GetInt32()));
        Assert.Equal("Rebuild beat the incumbent; promote it", history.GetProperty("revisions")[0].GetProperty("reason").GetString());
        Assert.Equal(2, decision.GetProperty("planRevision").GetInt32());
        Assert.Equal(2, decision.GetProperty("version").GetInt32());
        Assert.Equal("champion", decision.GetProperty("role").GetString());
        Assert.Equal(2, CountAudit(app, "traffic.changed"));
    }

    [Fact]
    public async Task ChangePlan_DraftVersion_Answers409NamingApprovalAndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);
        var draft = Scenario.Version();
        draft["description"] = "Not yet approved";
        var number = await Scenario.RegisterAsync(setup.Analyst, draft);

        var response = await setup.Risk.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(1, [(number, 0.1m)], [], "try the draft")));

        await response.AssertProblemAsync(HttpStatusCode.Conflict, $"version {number} is draft", "approval");
        Assert.Equal(0, app.CountRows("TrafficPlans"));
    }

    [Fact]
    public async Task ChangePlan_RetiredVersion_Answers409AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);
        (await setup.Risk.PostAsync($"/scorecards/{Scenario.Key}/versions/3/retirement", null)).EnsureSuccessStatusCode();

        var response = await setup.Risk.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(1, [], [3], "shadow the retired one")));

        await response.AssertProblemAsync(HttpStatusCode.Conflict, "version 3 is retired");
        Assert.Equal(0, app.CountRows("TrafficPlans"));
    }

    [Fact]
    public async Task ChangePlan_SharesSumToOne_Answers400AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);

        var response = await setup.Risk.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(1, [(2, 0.6m), (3, 0.4m)], [], "too much")));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "challengers", "sum to 1", "champion takes the rest");
        Assert.Equal(0, app.CountRows("TrafficPlans"));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    public async Task ChangePlan_ShareOutsideOpenInterval_Answers400(int share)
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);

        var response = await setup.Risk.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(1, [(2, share)], [], "edge")));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "challengers[0].share", "strictly between 0 and 1");
        Assert.Equal(0, app.CountRows("TrafficPlans"));
    }

    [Fact]
    public async Task ChangePlan_VersionInTwoRoles_Answers400NamingIt()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);

        var response = await setup.Risk.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(1, [(2, 0.1m)], [2], "both")));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "version 2 appears more than once", "one role only");
        Assert.Equal(0, app.CountRows("TrafficPlans"));
    }

    [Fact]
    public async Task ChangePlan_AnalystKey_Answers403()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);

        var response = await setup.Analyst.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(1, [], [], "analysts may not")));

        Assert.Equal(HttpStatusCode.Forbidden, response.StatusCode);
        Assert.Equal(0, app.CountRows("TrafficPlans"));
    }

    [Fact]
    public async Task GetPlan_NoneYet_Answers404NamingTheFix()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);

        var response = await setup.Risk.GetAsync(LiveScoringSetup.TrafficPath);

        await response.AssertProblemAsync(HttpStatusCode.NotFound, "no traffic plan yet", "PUT");
    }

    [Fact]
    public async Task ChangePlan_ThroughAnotherInstance_TakesEffectWithinOneSecond()
    {
        await using var first = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(first);
        await using var second = new LedgerlineApp(new Dictionary<string, string?> { ["ConnectionStrings:Ledgerline"] = first.ConnectionString });
        using var scoringOnSecond = second.CreateClient();
        scoringOnSecond.DefaultRequestHeaders.Authorization = setup.Scoring.DefaultRequestHeaders.Authorization;
        var before = await LiveScoringSetup.BodyAsync(await scoringOnSecond.PostAsync(LiveScoringSetup.DecisionsPath, Scenario.Json(LiveScoringSetup.Application("APP-A"))));

        (await setup.Risk.PutAsync(LiveScoringSetup.TrafficPath, Scenario.Json(Plan(2, [], [], "promote")))).EnsureSuccessStatusCode();
        await Task.Delay(TimeSpan.FromSeconds(1));
        var after = await LiveScoringSetup.BodyAsync(await scoringOnSecond.PostAsync(LiveScoringSetup.DecisionsPath, Scenario.Json(LiveScoringSetup.Application("APP-B"))));

        Assert.Equal(1, before.GetProperty("planRevision").GetInt32());
        Assert.Equal(2, after.GetProperty("planRevision").GetInt32());
    }

    public static JsonObject Plan(int champion, (int Version, decimal Share)[] challengers, int[] shadows, string reason) => new()
    {
        ["champion"] = champion,
        ["challengers"] = new JsonArray(challengers.Select(c => (JsonNode)new JsonObject { ["version"] = c.Version, ["share"] = c.Share }).ToArray()),
        ["shadows"] = new JsonArray(shadows.Select(s => (JsonNode)s).ToArray()),
        ["reason"] = reason,
    };

    private static long CountAudit(LedgerlineApp app, string action)
    {
        using var connection = app.OpenDatabase();
        using var command = connection.CreateCommand();
        command.CommandText = "SELECT COUNT(*) FROM \"AuditEntries\" WHERE \"Action\" = @action";
        var parameter = command.CreateParameter();
        parameter.ParameterName = "action";
        parameter.Value = action;
        command.Parameters.Add(parameter);
        return Convert.ToInt64(command.ExecuteScalar()!, System.Globalization.CultureInfo.InvariantCulture);
    }
}
