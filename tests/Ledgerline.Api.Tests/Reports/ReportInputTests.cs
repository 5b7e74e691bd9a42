using System.Net;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Reports;

public sealed class ReportInputTests
{
    private static readonly int[] UtilisationPoints = [40, 25, 5];

    [Theory]
    [InlineData("performance")]
    [InlineData("comparison")]
    [InlineData("stability")]
    public async Task Report_UnknownVersion_Answers404NamingIt(string report)
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);
        await lender.AddApprovedVersionAsync(MonitoredLender.Version("Only version", UtilisationPoints));

        var response = await lender.Analyst.GetAsync($"{MonitoredLender.Reports}/{report}?version=9");

        await response.AssertProblemAsync(HttpStatusCode.NotFound, "no version 9");
    }

    [Theory]
    [InlineData("performance")]
    [InlineData("comparison")]
    [InlineData("stability")]
    public async Task Report_FromAfterTo_Answers400NamingTheRange(string report)
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);
        await lender.AddApprovedVersionAsync(MonitoredLender.Version("Only version", UtilisationPoints));

        var response = await lender.Analyst.GetAsync($"{MonitoredLender.Reports}/{report}?version=1&from=2026-06-30&to=2026-01-01");

        var problem = await response.AssertProblemAsync(HttpStatusCode.BadRequest, "2026-06-30", "after 'to'");
        Assert.True(problem.GetProperty("errors").TryGetProperty("from", out _));
    }

    [Fact]
    public async Task Stability_UnknownPeriodWord_Answers400ListingTheWords()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);
        await lender.AddApprovedVersionAsync(MonitoredLender.Version("Only version", UtilisationPoints));

        var response = await lender.Analyst.GetAsync($"{MonitoredLender.Reports}/stability?version=1&period=fortnight");

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "'fortnight'", "'week' or 'month'");
    }

    [Fact]
    public async Task Report_DateNotInIsoForm_Answers400NamingTheParameter()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);

        var response = await lender.Analyst.GetAsync($"{MonitoredLender.Reports}/performance?to=31/12/2026");

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "to", "yyyy-MM-dd");
    }

    [Fact]
    public async Task Report_ScoringKey_IsForbidden()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);

        var response = await lender.Scoring.GetAsync($"{MonitoredLender.Reports}/performance");

        Assert.Equal(HttpStatusCode.Forbidden, response.StatusCode);
    }

    [Fact]
    public async Task Performance_NoOutcomesYet_GivesNullFiguresWithReasons()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);
        var version = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Champion", UtilisationPoints));
        await lender.SetPlanAsync(version);
        await lender.DecideAsync(120, "2026-09-10", seed: 41);

        var report = await MonitoredLender.GetJsonAsync(lender.Analyst, $"{MonitoredLender.Reports}/performance?from=2026-09-01&to=2026-09-30");

        var figures = report.GetProperty("versions").EnumerateArray().Single();
        Assert.Equal(120, figures.GetProperty("decisions").GetInt64());
        Assert.Equal(120, figures.GetProperty("approved").GetInt64());
        Assert.Equal(0, figures.GetProperty("matured").GetInt64());
        Assert.Equal(JsonValueKind.Null, figures.GetProperty("auc").ValueKind);
        Assert.Equal(JsonValueKind.Null, figures.GetProperty("badRate").ValueKind);
        Assert.Equal(JsonValueKind.Null, figures.GetProperty("ks").ValueKind);
        Assert.True(figures.GetProperty("unavailable").TryGetProperty("auc", out _));
        Assert.Contains("2026-09-01 to 2026-09-30", figures.GetProperty("population").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task AlertThresholds_RedBelowAmber_Answers400AndKeepsDefaults()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);

        var response = await lender.Risk.PutAsync($"/scorecards/{MonitoredLender.Key}/alert-thresholds", Scenario.Json("""
            { "psiAmber": 0.3, "psiRed": 0.2, "csiAmber": 0.1, "csiRed": 0.25, "aucDecline": 0.05, "hosmerLemeshowP": 0.01, "sampleRatioP": 0.001 }
            """));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "PSI red threshold must be at least the amber one");
        Assert.Equal(0, app.CountRows("AlertThresholds"));
        var stored = await MonitoredLender.GetJsonAsync(lender.Analyst, $"/scorecards/{MonitoredLender.Key}/alert-thresholds");
        Assert.True(stored.GetProperty("defaults").GetBoolean());
        Assert.Equal(0.10, stored.GetProperty("psiAmber").GetDouble());
        Assert.Equal(0.25, stored.GetProperty("psiRed").GetDouble());
        Assert.Equal(0.05, stored.GetProperty("aucDecline").GetDouble());
    }

    [Fact]
    public async Task AlertThresholds_AnalystMayReadButNotChange()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);

        var change = await lender.Analyst.PutAsync($"/scorecards/{MonitoredLender.Key}/alert-thresholds", Scenario.Json("""
            { "psiAmber": 0.1, "psiRed": 0.2, "csiAmber": 0.1, "csiRed": 0.25, "aucDecline": 0.05, "hosmerLemeshowP": 0.01, "sampleRatioP": 0.001 }
            """));
        var evaluate = await lender.Analyst.PostAsync($"/scorecards/{MonitoredLender.Key}/alerts/evaluation", null);

        Assert.Equal(HttpStatusCode.Forbidden, change.StatusCode);
        Assert.Equal(HttpStatusCode.Forbidden, evaluate.StatusCode);
    }
}
