using System.Net.Http.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Outcomes;

/// <summary>
/// The current outcome over several posts. Window of the fixtures: 15 March 2025 to 15 March
/// 2026, both included; bad from 90 days past due, indeterminate from 30.
/// </summary>
public sealed class OutcomeHistoryTests
{
    [Fact]
    public async Task Decision_BadThatCuresInLaterPost_StaysBadAndKeepsBothObservations()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");

        await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(new { applicationId = "APP-1", observedAt = "2025-10-01", worstDaysPastDue = 95 }));
        await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(new { applicationId = "APP-1", observedAt = "2026-04-01", worstDaysPastDue = 0 }));

        var outcome = await setup.OutcomeOfAsync("APP-1");
        Assert.Equal("bad", outcome.GetProperty("status").GetString());
        Assert.True(outcome.GetProperty("matured").GetBoolean());
        Assert.Equal("2026-04-01", outcome.GetProperty("observedAt").GetString());
        var observations = outcome.GetProperty("observations").EnumerateArray().ToList();
        Assert.Equal(2, observations.Count);
        Assert.Equal("bad", observations[0].GetProperty("classified").GetString());
        Assert.Equal("good", observations[1].GetProperty("classified").GetString());
    }

    [Fact]
    public async Task Decision_GoodBeforeTheWindowEnd_IsNotMatured()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1", "APP-2");

        await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(
            new { applicationId = "APP-1", observedAt = "2026-03-14", worstDaysPastDue = 0 },
            new { applicationId = "APP-2", observedAt = OutcomeSetup.WindowEnd, worstDaysPastDue = 0 }));

        Assert.False((await setup.OutcomeOfAsync("APP-1")).GetProperty("matured").GetBoolean());
        Assert.True((await setup.OutcomeOfAsync("APP-2")).GetProperty("matured").GetBoolean());
    }

    [Fact]
    public async Task Decision_ChargeOffAfterTheWindow_KeepsTheInWindowClass()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");

        await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(
            new { applicationId = "APP-1", observedAt = "2026-03-01", worstDaysPastDue = 10 },
            new { applicationId = "APP-1", observedAt = "2026-05-01", chargedOff = true }));

        var outcome = await setup.OutcomeOfAsync("APP-1");
        Assert.Equal("good", outcome.GetProperty("status").GetString());
        Assert.True(outcome.GetProperty("matured").GetBoolean());
    }

    [Fact]
    public async Task RecordOutcomes_ReadingsOfOneAccountAcrossChunks_AllCountTowardsTheOutcome()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");
        // Rows are written 2,000 at a time: the bad reading sits in the second chunk, the cure in the third.
        var rows = Enumerable.Range(0, 4500).Select(i => (object)new
        {
            applicationId = "APP-1",
            observedAt = i == 2500 ? "2025-12-01" : "2026-04-01",
            worstDaysPastDue = i == 2500 ? 120 : 0,
        }).ToArray();

        var body = await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(rows));

        Assert.Equal(4500, body.GetProperty("accepted").GetInt32());
        Assert.Equal(4500, app.CountRows("Outcomes"));
        Assert.Equal("bad", (await setup.OutcomeOfAsync("APP-1")).GetProperty("status").GetString());
    }

    [Fact]
    public async Task RecordOutcomes_ApplicationDecidedUnderAnotherScorecard_IsNamedWithThatScorecard()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");
        const string other = "car-loan-application";
        await Scenario.CreateFamilyAsync(setup.Live.Analyst, other);
        await Scenario.RegisterAsync(setup.Live.Analyst, Scenario.Version(), other);
        var baseline = JsonNode.Parse("""
            { "records": [ { "characteristics": { "monthsAtAddress": 30, "residentialStatus": "tenant" }, "bad": false },
                           { "characteristics": { "monthsAtAddress": 5, "residentialStatus": "owner" }, "bad": true } ] }
            """)!;
        (await setup.Live.Analyst.PutAsync($"/scorecards/{other}/versions/1/baseline", Scenario.Json(baseline))).EnsureSuccessStatusCode();
        (await setup.Live.Risk.PostAsync($"/scorecards/{other}/versions/1/approval", null)).EnsureSuccessStatusCode();
        (await setup.Live.Risk.PutAsJsonAsync($"/scorecards/{other}/traffic", new { champion = 1, challengers = Array.Empty<object>(), shadows = Array.Empty<int>(), reason = "Launch" })).EnsureSuccessStatusCode();
        var car = (JsonObject)Decisions.LiveScoringSetup.Application("CAR-1");
        car["applicationDate"] = OutcomeSetup.ApplicationDate;
        (await setup.Live.Scoring.PostAsync($"/scorecards/{other}/decisions", Scenario.Json(car))).EnsureSuccessStatusCode();

        var body = await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(new { applicationId = "CAR-1", observedAt = "2026-04-01", worstDaysPastDue = 0 }));

        Assert.Equal(0, body.GetProperty("accepted").GetInt32());
        var error = Assert.Single(body.GetProperty("rejected").EnumerateArray()).GetProperty("error").GetString();
        Assert.Contains($"decided under scorecard '{other}', not '{Scenario.Key}'", error, StringComparison.Ordinal);
        Assert.Equal(0, app.CountRows("Outcomes"));
    }
}
