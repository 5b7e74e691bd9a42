using System.Net;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Reports;

public sealed class StabilityAndAlertTests
{
    private static readonly int[] UtilisationPoints = [40, 25, 5];

    private static async Task<(MonitoredLender Lender, int Version)> ChampionOnlyAsync(LedgerlineApp app)
    {
        var lender = await MonitoredLender.CreateAsync(app);
        var version = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Champion", UtilisationPoints));
        await lender.SetPlanAsync(version);
        return (lender, version);
    }

    [Fact]
    public async Task Stability_PopulationLikeDevelopment_IsGreenPerMonth()
    {
        await using var app = new LedgerlineApp();
        var (lender, version) = await ChampionOnlyAsync(app);
        await lender.DecideAsync(800, "2026-09-10", seed: 11);
        await lender.DecideAsync(800, "2026-10-10", seed: 12);

        var report = await MonitoredLender.GetJsonAsync(lender.Analyst, $"{MonitoredLender.Reports}/stability?version={version}&period=month");

        Assert.Equal(version, report.GetProperty("version").GetInt32());
        var periods = report.GetProperty("periods").EnumerateArray().ToList();
        Assert.Equal(["2026-09", "2026-10"], periods.Select(p => p.GetProperty("period").GetString()));
        Assert.All(periods, p =>
        {
            Assert.Equal(800, p.GetProperty("n").GetInt64());
            // Same generating model as the development sample: PSI well below 0.10 (common practice).
            Assert.InRange(p.GetProperty("psi").GetDouble(), 0, 0.10);
            Assert.Equal("green", p.GetProperty("status").GetString());
            Assert.Equal(["monthsAtAddress", "cardUtilisation"], p.GetProperty("characteristics").EnumerateArray().Select(c => c.GetProperty("name").GetString()));
        });
    }

    [Fact]
    public async Task Stability_WeekPeriod_GroupsByIsoWeek()
    {
        await using var app = new LedgerlineApp();
        var (lender, version) = await ChampionOnlyAsync(app);
        await lender.DecideAsync(50, "2026-11-02", seed: 3);
        await lender.DecideAsync(50, "2026-11-08", seed: 4);
        await lender.DecideAsync(50, "2026-11-09", seed: 5);

        var report = await MonitoredLender.GetJsonAsync(lender.Risk, $"{MonitoredLender.Reports}/stability?version={version}&period=week");

        // 2026-11-02 (Monday) and 2026-11-08 (Sunday) share ISO week 45; 2026-11-09 starts week 46 (ISO 8601).
        var periods = report.GetProperty("periods").EnumerateArray().Select(p => (p.GetProperty("period").GetString(), p.GetProperty("n").GetInt64())).ToList();
        Assert.Equal([("2026-W45", 100L), ("2026-W46", 50L)], periods);
    }

    [Fact]
    public async Task Alerts_ShiftedPopulation_TurnsRedOpensOnceAndClosesWhenShiftEnds()
    {
        await using var receiver = new WebhookReceiver();
        await using var app = new LedgerlineApp(new Dictionary<string, string?>
        {
            ["Alerts:WebhookUrl"] = receiver.Url,
            ["Alerts:WebhookPollSeconds"] = "0.05",
        });
        var (lender, version) = await ChampionOnlyAsync(app);
        await lender.DecideAsync(400, "2026-09-10", seed: 21, shifted: true);

        var stability = await MonitoredLender.GetJsonAsync(lender.Risk, $"{MonitoredLender.Reports}/stability?version={version}");
        var shifted = stability.GetProperty("periods")[0];
        Assert.Equal("red", shifted.GetProperty("status").GetString());
        Assert.True(shifted.GetProperty("psi").GetDouble() >= 0.25);
        Assert.All(shifted.GetProperty("characteristics").EnumerateArray(), c => Assert.Equal("red", c.GetProperty("status").GetString()));

        var first = await EvaluateAsync(lender);
        var second = await EvaluateAsync(lender);
        Assert.Equal(3, first.GetProperty("opened").GetInt32());
        Assert.Equal(0, second.GetProperty("opened").GetInt32());

        var alerts = (await MonitoredLender.GetJsonAsync(lender.Analyst, $"/scorecards/{MonitoredLender.Key}/alerts")).GetProperty("alerts").EnumerateArray().ToList();
        Assert.Equal(3, alerts.Count);
        var psi = alerts.Single(a => a.GetProperty("kind").GetString() == "psi");
        Assert.Equal(version, psi.GetProperty("version").GetInt32());
        Assert.Equal("2026-09", psi.GetProperty("period").GetString());
        Assert.Equal("red", psi.GetProperty("severity").GetString());
        Assert.Equal(0.25, psi.GetProperty("threshold").GetDouble());
        Assert.Equal(shifted.GetProperty("psi").GetDouble(), psi.GetProperty("figure").GetDouble(), 12);
        Assert.Equal(["cardUtilisation", "monthsAtAddress"], alerts.Where(a => a.GetProperty("kind").GetString() == "csi").Select(a => a.GetProperty("subject").GetString()).Order());
        Assert.Equal(3, app.CountRows("Alerts"));

        Assert.True(await receiver.WaitForAsync(3, TimeSpan.FromSeconds(10)), $"webhook received {receiver.Received.Count} of 3");
        await Task.Delay(200);
        Assert.Equal(3, receiver.Received.Count);

        await lender.DecideAsync(800, "2026-10-10", seed: 22);
        var third = await EvaluateAsync(lender);
        Assert.Equal(3, third.GetProperty("closed").GetInt32());
        Assert.Empty((await MonitoredLender.GetJsonAsync(lender.Risk, $"/scorecards/{MonitoredLender.Key}/alerts")).GetProperty("alerts").EnumerateArray());
    }

    [Fact]
    public async Task AlertWebhook_ReceiverRefusesFirst_RetriesAndDeliversOnce()
    {
        await using var receiver = new WebhookReceiver(refuseFirst: 2);
        await using var app = new LedgerlineApp(new Dictionary<string, string?>
        {
            ["Alerts:WebhookUrl"] = receiver.Url,
            ["Alerts:WebhookPollSeconds"] = "0.05",
            ["Alerts:WebhookFirstRetrySeconds"] = "0.1",
        });
        var (lender, _) = await ChampionOnlyAsync(app);
        await lender.DecideAsync(300, "2026-09-10", seed: 23, shifted: true);

        var evaluation = await EvaluateAsync(lender);

        var opened = evaluation.GetProperty("opened").GetInt32();
        Assert.Equal(3, opened);
        Assert.True(await receiver.WaitForAsync(opened, TimeSpan.FromSeconds(10)), $"webhook received {receiver.Received.Count} of {opened}");
        await Task.Delay(300);
        Assert.Equal(2, receiver.Refused);
        var delivered = receiver.Received.Select(body => JsonDocument.Parse(body).RootElement).ToList();
        Assert.Equal(opened, delivered.Count);
        Assert.All(delivered, d => Assert.Equal(MonitoredLender.Key, d.GetProperty("scorecard").GetString()));
        Assert.Equal(["csi", "csi", "psi"], delivered.Select(d => d.GetProperty("alert").GetProperty("kind").GetString()).Order());
    }

    [Fact]
    public async Task Stability_VersionWithoutBaseline_AnswersUnavailableWithReason()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);
        var draft = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Draft without baseline", UtilisationPoints), withBaseline: false);

        var report = await MonitoredLender.GetJsonAsync(lender.Analyst, $"{MonitoredLender.Reports}/stability?version={draft}");

        Assert.False(report.GetProperty("available").GetBoolean());
        Assert.Contains("no development baseline", report.GetProperty("reason").GetString(), StringComparison.Ordinal);
        Assert.Empty(report.GetProperty("periods").EnumerateArray());
    }

    [Fact]
    public async Task Stability_AcceptCsv_AnswersOneRowPerPeriodAndSubject()
    {
        await using var app = new LedgerlineApp();
        var (lender, version) = await ChampionOnlyAsync(app);
        await lender.DecideAsync(100, "2026-09-10", seed: 31);
        using var request = new HttpRequestMessage(HttpMethod.Get, $"{MonitoredLender.Reports}/stability?version={version}");
        request.Headers.Accept.ParseAdd("text/csv");

        var response = await lender.Analyst.SendAsync(request);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
        var lines = (await response.Content.ReadAsStringAsync()).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("version,period,n,subject,index,status,missingShare,developmentMissingShare", lines[0]);
        Assert.Equal(4, lines.Length);
        Assert.StartsWith($"{version},2026-09,100,score,", lines[1], StringComparison.Ordinal);
        Assert.StartsWith($"{version},2026-09,100,monthsAtAddress,", lines[2], StringComparison.Ordinal);
    }

    private static async Task<JsonElement> EvaluateAsync(MonitoredLender lender)
    {
        var response = await lender.Risk.PostAsync($"/scorecards/{MonitoredLender.Key}/alerts/evaluation", null);
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, body);
        return JsonDocument.Parse(body).RootElement;
    }
}
