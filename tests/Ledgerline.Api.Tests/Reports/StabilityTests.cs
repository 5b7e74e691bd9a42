using System.Net;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Reports;

public sealed class StabilityTests
{
    [Fact]
    public async Task Stability_PopulationLikeDevelopment_IsGreenPerMonth()
    {
        await using var app = new LedgerlineApp();
        var (lender, version) = await MonitoredLender.ChampionOnlyAsync(app);
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
        var (lender, version) = await MonitoredLender.ChampionOnlyAsync(app);
        await lender.DecideAsync(50, "2026-11-02", seed: 3);
        await lender.DecideAsync(50, "2026-11-08", seed: 4);
        await lender.DecideAsync(50, "2026-11-09", seed: 5);

        var report = await MonitoredLender.GetJsonAsync(lender.Risk, $"{MonitoredLender.Reports}/stability?version={version}&period=week");

        // 2026-11-02 (Monday) and 2026-11-08 (Sunday) share ISO week 45; 2026-11-09 starts week 46 (ISO 8601).
        var periods = report.GetProperty("periods").EnumerateArray().Select(p => (p.GetProperty("period").GetString(), p.GetProperty("n").GetInt64())).ToList();
        Assert.Equal([("2026-W45", 100L), ("2026-W46", 50L)], periods);
    }

    [Fact]
    public async Task Stability_VersionWithoutBaseline_AnswersUnavailableWithReason()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);
        var draft = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Draft without baseline", [40, 25, 5]), withBaseline: false);

        var report = await MonitoredLender.GetJsonAsync(lender.Analyst, $"{MonitoredLender.Reports}/stability?version={draft}");

        Assert.False(report.GetProperty("available").GetBoolean());
        Assert.Contains("no development baseline", report.GetProperty("reason").GetString(), StringComparison.Ordinal);
        Assert.Empty(report.GetProperty("periods").EnumerateArray());
    }

    [Fact]
    public async Task Stability_AcceptCsv_AnswersOneRowPerPeriodAndSubject()
    {
        await using var app = new LedgerlineApp();
        var (lender, version) = await MonitoredLender.ChampionOnlyAsync(app);
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
}
