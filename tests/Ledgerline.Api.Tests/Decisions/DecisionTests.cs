using System.Net;
using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Decisions;

public sealed class DecisionTests
{
    [Fact]
    public async Task Decide_WithPlan_Answers201WithContractFieldsAndLogsEveryVersion()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var response = await setup.DecideAsync(LiveScoringSetup.Application("APP-0001234"));

        var body = await LiveScoringSetup.BodyAsync(response);
        Assert.True(response.StatusCode == HttpStatusCode.Created, body.ToString());
        // The contract's fields in its order; "unmatched" follows only when a value took other or missing points.
        var names = body.EnumerateObject().Select(p => p.Name).ToList();
        Assert.Equal(
            ["decisionId", "applicationId", "version", "role", "score", "probabilityOfBad", "decision", "planRevision", "reasonCodes"],
            names.Take(9));
        Assert.Equal(body.GetProperty("version").GetInt32() == 2 ? ["unmatched"] : [], names.Skip(9));
        Assert.Equal("APP-0001234", body.GetProperty("applicationId").GetString());
        Assert.Equal(1, app.CountRows("Decisions"));
        Assert.Equal(3, app.CountRows("DecisionScores"));
    }

    [Fact]
    public async Task Decide_DecidingScore_EqualsTryingThatVersionAlone()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app, 0.5m);
        var application = LiveScoringSetup.Application("APP-77", monthsAtAddress: 8, residentialStatus: "with-family");

        var decision = await LiveScoringSetup.BodyAsync(await setup.DecideAsync(application));
        var version = decision.GetProperty("version").GetInt32();
        var alone = await LiveScoringSetup.BodyAsync(await setup.Analyst.PostAsync(
            $"/scorecards/{Scenario.Key}/versions/{version}/score", Scenario.Json(new JsonObject { ["characteristics"] = application["characteristics"]!.DeepClone() })));

        // Version 1 alone: 38 (months < 12) + 55 (with-family) = 93; version 2 adds 35 missing points.
        Assert.Equal(version == 1 ? 93m : 128m, decision.GetProperty("score").GetDecimal());
        Assert.Equal(alone.GetProperty("score").GetDecimal(), decision.GetProperty("score").GetDecimal());
        Assert.Equal(alone.GetProperty("decision").GetString(), decision.GetProperty("decision").GetString());
        Assert.Equal(alone.GetProperty("reasonCodes").ToString(), decision.GetProperty("reasonCodes").ToString());
    }

    [Fact]
    public async Task Decide_SameAssignmentKey_SameArmForEveryApplication()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app, 0.5m);
        var versions = new HashSet<int>();
        var byApplication = new HashSet<int>();

        for (var i = 0; i < 12; i++)
        {
            var application = LiveScoringSetup.Application($"APP-K{i}");
            application["assignmentKey"] = "CUST-0042";
            versions.Add((await LiveScoringSetup.BodyAsync(await setup.DecideAsync(application))).GetProperty("version").GetInt32());
            byApplication.Add((await LiveScoringSetup.BodyAsync(await setup.DecideAsync(LiveScoringSetup.Application($"APP-N{i}")))).GetProperty("version").GetInt32());
        }

        Assert.Single(versions);
        Assert.Equal(2, byApplication.Count); // with a 50% share, 12 application ids all on one arm has odds 1 in 2,048
    }

    [Fact]
    public async Task Decide_CategoryNoBinLists_AnswerSaysItFellIntoOtherAndAReplaySaysTheSame()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app, 0.5m);
        // "Tenant" is not "tenant": categories are compared exactly, so it takes otherPoints (48).
        var application = LiveScoringSetup.Application("APP-U1", residentialStatus: "Tenant");

        var first = await LiveScoringSetup.BodyAsync(await setup.DecideAsync(application));
        var replay = await LiveScoringSetup.BodyAsync(await setup.DecideAsync(application));
        var matched = await LiveScoringSetup.BodyAsync(await setup.DecideAsync(LiveScoringSetup.Application("APP-U2", residentialStatus: "tenant")));

        const string other = """{"characteristic":"residentialStatus","value":"Tenant","bin":"other"}""";
        var unmatched = first.GetProperty("unmatched").GetRawText();
        if (first.GetProperty("version").GetInt32() == 2)
        {
            // Version 2 also reads a characteristic the application does not send (its missing points apply).
            Assert.Contains("\"bin\":\"missing\"", unmatched, StringComparison.Ordinal);
            Assert.Contains(other, unmatched, StringComparison.Ordinal);
        }
        else
        {
            Assert.Equal("[" + other + "]", unmatched);
        }

        Assert.Equal(unmatched, replay.GetProperty("unmatched").GetRawText());
        if (matched.GetProperty("version").GetInt32() == 1)
        {
            Assert.False(matched.TryGetProperty("unmatched", out _), matched.ToString());
        }
    }

    [Fact]
    public async Task Decide_NoPlan_Answers409NamingTrafficPlanAndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.CreateAsync(app);

        var response = await setup.DecideAsync(LiveScoringSetup.Application("APP-1"));

        await response.AssertProblemAsync(HttpStatusCode.Conflict, "no traffic plan", $"PUT /scorecards/{Scenario.Key}/traffic");
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task Decide_UnknownScorecard_Answers404()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var response = await setup.Scoring.PostAsync("/scorecards/no-such-card/decisions", Scenario.Json(LiveScoringSetup.Application("APP-1")));

        await response.AssertProblemAsync(HttpStatusCode.NotFound, "no-such-card");
    }

    [Fact]
    public async Task Decide_CharacteristicNoVersionUses_Answers400NamingItAndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-1");
        application["characteristics"]!["monthsAtAdress"] = 12;

        var response = await setup.DecideAsync(application);

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "characteristics.monthsAtAdress", "no version", "monthsAtAddress");
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task Decide_CharacteristicOnlyAChallengerUses_IsAccepted()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-1");
        application["characteristics"]!["cardUtilisation"] = 0.5;

        var response = await setup.DecideAsync(application);

        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
    }

    [Fact]
    public async Task Decide_WrongType_Answers400NamingCharacteristicAndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-1");
        application["characteristics"]!["monthsAtAddress"] = "thirty";

        var response = await setup.DecideAsync(application);

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "characteristics.monthsAtAddress", "numeric", "'thirty'");
        Assert.Equal(0, app.CountRows("Decisions"));
        Assert.Equal(0, app.CountRows("DecisionScores"));
    }

    [Fact]
    public async Task Decide_MissingValueWithoutMissingPoints_Answers400AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-1");
        application["characteristics"]!.AsObject().Remove("residentialStatus");

        var response = await setup.DecideAsync(application);

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "characteristics.residentialStatus", "missing", "missingPoints");
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Theory]
    [InlineData("2999-01-01", "in the future")]
    [InlineData("30/11/2026", "yyyy-MM-dd")]
    [InlineData("2026-02-30", "not a date")]
    public async Task Decide_BadApplicationDate_Answers400AndStoresNothing(string date, string mention)
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-1");
        application["applicationDate"] = date;

        var response = await setup.DecideAsync(application);

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "applicationDate", mention);
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Theory]
    [InlineData(0, "must give the application's id")]
    [InlineData(101, "at most 100")]
    public async Task Decide_BadApplicationIdLength_Answers400AndStoresNothing(int length, string mention)
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var response = await setup.DecideAsync(LiveScoringSetup.Application(new string('A', length)));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "applicationId", mention);
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task Decide_NoApplicationDate_DefaultsToToday()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-1");
        application.Remove("applicationDate");

        (await setup.DecideAsync(application)).EnsureSuccessStatusCode();
        var record = await LiveScoringSetup.BodyAsync(await setup.Risk.GetAsync($"{LiveScoringSetup.DecisionsPath}/APP-1"));

        Assert.Equal(DateOnly.FromDateTime(DateTime.UtcNow), DateOnly.Parse(record.GetProperty("applicationDate").GetString()!, System.Globalization.CultureInfo.InvariantCulture));
    }

    [Fact]
    public async Task Decide_AnalystKey_Answers403()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var response = await setup.Analyst.PostAsync(LiveScoringSetup.DecisionsPath, Scenario.Json(LiveScoringSetup.Application("APP-1")));

        Assert.Equal(HttpStatusCode.Forbidden, response.StatusCode);
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task Decide_ShadowCannotScoreInput_DecisionStandsAndShadowErrorRecorded()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        // Version 3 (shadow) needs cardUtilisation and gives no missing points; the application lacks it.
        var response = await setup.DecideAsync(LiveScoringSetup.Application("APP-1"));
        var record = await LiveScoringSetup.BodyAsync(await setup.Risk.GetAsync($"{LiveScoringSetup.DecisionsPath}/APP-1"));

        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        var shadow = record.GetProperty("otherScores").EnumerateArray().Single(s => s.GetProperty("version").GetInt32() == 3);
        Assert.Equal("shadow", shadow.GetProperty("role").GetString());
        Assert.False(shadow.TryGetProperty("score", out _));
        Assert.Contains("cardUtilisation", shadow.GetProperty("error").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task GetDecision_Logged_HasDecidingBinsPointsAndEveryOtherScoreButNoRawValues()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-9", monthsAtAddress: 50, residentialStatus: "owner");
        application["characteristics"]!["cardUtilisation"] = 0.8;
        var decided = await LiveScoringSetup.BodyAsync(await setup.DecideAsync(application));

        var response = await setup.Analyst.GetAsync($"{LiveScoringSetup.DecisionsPath}/APP-9");
        var record = await LiveScoringSetup.BodyAsync(response);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal(decided.GetProperty("decisionId").GetString(), record.GetProperty("decisionId").GetString());
        Assert.Equal(decided.GetProperty("score").GetDecimal(), record.GetProperty("score").GetDecimal());
        Assert.Equal(1, record.GetProperty("planRevision").GetInt32());
        var months = record.GetProperty("characteristics").EnumerateArray().Single(c => c.GetProperty("name").GetString() == "monthsAtAddress");
        Assert.Equal(2, months.GetProperty("bin").GetInt32());
        Assert.Equal(71m, months.GetProperty("points").GetDecimal());
        Assert.Equal(2, record.GetProperty("otherScores").GetArrayLength());
        Assert.All(record.GetProperty("otherScores").EnumerateArray(), s => Assert.True(s.TryGetProperty("score", out _)));
        Assert.DoesNotContain("0.8", record.ToString(), StringComparison.Ordinal);
        Assert.False(record.TryGetProperty("outcome", out _));
    }

    [Fact]
    public async Task GetDecision_Unknown_Answers404()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var response = await setup.Risk.GetAsync($"{LiveScoringSetup.DecisionsPath}/APP-NONE");

        await response.AssertProblemAsync(HttpStatusCode.NotFound, "APP-NONE");
    }

    public static JsonElement Parse(string text) => JsonDocument.Parse(text).RootElement;
}
