using System.Net;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;
using Ledgerline.Api.Tests.Reports;

namespace Ledgerline.Api.Tests.Alerts;

public sealed class AlertTests
{
    [Fact]
    public async Task Alerts_ShiftedPopulation_TurnsRedOpensOnceAndClosesWhenShiftEnds()
    {
        await using var receiver = new WebhookReceiver();
        await using var app = new LedgerlineApp(new Dictionary<string, string?>
        {
            ["Alerts:WebhookUrl"] = receiver.Url,
            ["Alerts:WebhookPollSeconds"] = "0.05",
        });
        var (lender, version) = await MonitoredLender.ChampionOnlyAsync(app);
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
        var (lender, _) = await MonitoredLender.ChampionOnlyAsync(app);
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

    private static async Task<JsonElement> EvaluateAsync(MonitoredLender lender)
    {
        var response = await lender.Risk.PostAsync($"/scorecards/{MonitoredLender.Key}/alerts/evaluation", null);
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.OK, body);
        return JsonDocument.Parse(body).RootElement;
    }
}
