using System.Net;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Reports;

/// <summary>
/// Champion against challenger on simulated traffic whose truth is known: the invented generating
/// model makes card utilisation the strongest driver of going bad, the champion ignores it and the
/// challenger scores it, so the challenger truly separates better.
/// </summary>
public sealed class ComparisonTests
{
    private static readonly int[] IgnoresUtilisation = [25, 25, 25];
    private static readonly int[] ScoresUtilisation = [40, 25, 5];

    private static async Task<(MonitoredLender Lender, HttpClient Outcomes, List<(string Id, Applicant Applicant)> Decided)> TrafficAsync(
        LedgerlineApp app, int[] championPoints, int[] challengerPoints, int applications)
    {
        var lender = await MonitoredLender.CreateAsync(app);
        var champion = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Champion", championPoints), baselineRows: 200);
        var challenger = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Challenger", challengerPoints), baselineRows: 200);
        await lender.SetPlanAsync(champion, challenger, share: 0.5);
        // Applications from June 2025: a 12-month window has elapsed by July 2026, so every good is matured.
        var decided = await lender.DecideAsync(applications, "2025-06-10", seed: 51);
        return (lender, await app.ClientWithRolesAsync("outcomes"), decided);
    }

    private static async Task<JsonElement> ComparisonAsync(MonitoredLender lender) =>
        await MonitoredLender.GetJsonAsync(lender.Risk, $"{MonitoredLender.Reports}/comparison?from=2025-06-01&to=2025-06-30");

    [Fact]
    public async Task Comparison_ChallengerTrulyBetterWithManyMaturedOutcomes_VerdictChallengerBetter()
    {
        await using var app = new LedgerlineApp();
        var (lender, outcomes, decided) = await TrafficAsync(app, IgnoresUtilisation, ScoresUtilisation, 1600);
        await MonitoredLender.PostOutcomesAsync(outcomes, MonitoredLender.Key, decided.Select(d => (d.Id, d.Applicant.Bad)), "2026-07-01");

        var report = await ComparisonAsync(lender);

        Assert.Equal(1, report.GetProperty("champion").GetProperty("version").GetInt32());
        var challenger = report.GetProperty("challengers").EnumerateArray().Single();
        Assert.Equal(2, challenger.GetProperty("version").GetInt32());
        Assert.Equal("challenger better", challenger.GetProperty("verdict").GetString());
        Assert.True(challenger.GetProperty("aucDifference").GetDouble() > 0.05);
        Assert.Equal(challenger.GetProperty("auc").GetDouble() - report.GetProperty("champion").GetProperty("auc").GetDouble(),
            challenger.GetProperty("aucDifference").GetDouble(), 12);
        Assert.Equal(1600, challenger.GetProperty("pairedTest").GetProperty("n").GetInt64());
        Assert.True(challenger.GetProperty("pairedTest").GetProperty("pValue").GetDouble() < 0.05);
        Assert.True(challenger.GetProperty("unpairedTest").TryGetProperty("z", out _));
        Assert.Contains("p < 0.05", challenger.GetProperty("verdictRule").GetString(), StringComparison.Ordinal);
        // Every version approves everything: the swap set is all approve/approve.
        var swaps = challenger.GetProperty("swapSet").EnumerateArray().ToList();
        Assert.Equal(1600, swaps.Single(s => s.GetProperty("champion").GetString() == "approve" && s.GetProperty("challenger").GetString() == "approve").GetProperty("count").GetInt64());
        Assert.Equal(1600, swaps.Sum(s => s.GetProperty("count").GetInt64()));
        // The realised split of the plan is checked against its 50/50 shares.
        var ratio = report.GetProperty("sampleRatio").EnumerateArray().Single();
        Assert.Equal(1600, ratio.GetProperty("arms").EnumerateArray().Sum(a => a.GetProperty("decisions").GetInt64()));
        Assert.True(ratio.GetProperty("pValue").GetDouble() > 0.001);
    }

    [Fact]
    public async Task Comparison_FewMaturedOutcomes_VerdictNotEnoughMaturedOutcomes()
    {
        await using var app = new LedgerlineApp();
        var (lender, outcomes, decided) = await TrafficAsync(app, IgnoresUtilisation, ScoresUtilisation, 400);
        await MonitoredLender.PostOutcomesAsync(outcomes, MonitoredLender.Key, decided.Take(40).Select(d => (d.Id, d.Applicant.Bad)), "2026-07-01");

        var report = await ComparisonAsync(lender);

        var challenger = report.GetProperty("challengers").EnumerateArray().Single();
        Assert.Equal("not enough matured outcomes", challenger.GetProperty("verdict").GetString());
        Assert.Equal(40, challenger.GetProperty("pairedTest").GetProperty("n").GetInt64());
        Assert.True(challenger.GetProperty("power").GetProperty("maturedNeededPerArmForAuc").GetInt64() > 0);
    }

    [Fact]
    public async Task Comparison_IdenticalPointsTables_VerdictNoDifferenceShown()
    {
        await using var app = new LedgerlineApp();
        var (lender, outcomes, decided) = await TrafficAsync(app, ScoresUtilisation, ScoresUtilisation, 1000);
        await MonitoredLender.PostOutcomesAsync(outcomes, MonitoredLender.Key, decided.Select(d => (d.Id, d.Applicant.Bad)), "2026-07-01");

        var report = await ComparisonAsync(lender);

        var challenger = report.GetProperty("challengers").EnumerateArray().Single();
        Assert.Equal("no difference shown", challenger.GetProperty("verdict").GetString());
        Assert.Equal(0, challenger.GetProperty("aucDifference").GetDouble());
        Assert.Equal(JsonValueKind.Null, challenger.GetProperty("pairedTest").GetProperty("pValue").ValueKind);
    }

    [Fact]
    public async Task Comparison_ChampionChangedWithinTheRange_PairsOnlyTheApplicationsDecidedUnderTheReportedChampion()
    {
        await using var app = new LedgerlineApp();
        var lender = await MonitoredLender.CreateAsync(app);
        var first = await lender.AddApprovedVersionAsync(MonitoredLender.Version("First champion", IgnoresUtilisation), baselineRows: 200);
        var second = await lender.AddApprovedVersionAsync(MonitoredLender.Version("Second champion", ScoresUtilisation), baselineRows: 200);
        await lender.SetPlanAsync(first, second, share: 0.5);
        var underFirst = await lender.DecideAsync(300, "2025-06-10", seed: 61, prefix: "FIRST");
        await lender.SetPlanAsync(second, first, share: 0.5);
        var underSecond = await lender.DecideAsync(200, "2025-06-20", seed: 62, prefix: "SECOND");
        var outcomes = await app.ClientWithRolesAsync("outcomes");
        await MonitoredLender.PostOutcomesAsync(outcomes, MonitoredLender.Key, underFirst.Concat(underSecond).Select(d => (d.ApplicationId, d.Applicant.Bad)), "2026-07-01");

        var report = await ComparisonAsync(lender);

        // The latest revision's champion is reported; its pairs are the applications decided while
        // it was champion, though both versions scored all 500.
        Assert.Equal(second, report.GetProperty("champion").GetProperty("version").GetInt32());
        var challenger = report.GetProperty("challengers").EnumerateArray().Single();
        Assert.Equal(first, challenger.GetProperty("version").GetInt32());
        Assert.Equal(200, challenger.GetProperty("pairedTest").GetProperty("n").GetInt64());
        Assert.Equal(200, challenger.GetProperty("swapSet").EnumerateArray().Sum(s => s.GetProperty("count").GetInt64()));
        Assert.Contains($"while version {second} was champion", challenger.GetProperty("pairedTest").GetProperty("population").GetString(), StringComparison.Ordinal);
        // The split is still checked for each revision, over all 500 decisions.
        var revisions = report.GetProperty("sampleRatio").EnumerateArray().ToList();
        Assert.Equal(2, revisions.Count);
        Assert.Equal(500, revisions.Sum(r => r.GetProperty("arms").EnumerateArray().Sum(a => a.GetProperty("decisions").GetInt64())));
    }

    [Fact]
    public async Task Comparison_AcceptCsv_AnswersChampionAndChallengerRows()
    {
        await using var app = new LedgerlineApp();
        var (lender, outcomes, decided) = await TrafficAsync(app, IgnoresUtilisation, ScoresUtilisation, 200);
        await MonitoredLender.PostOutcomesAsync(outcomes, MonitoredLender.Key, decided.Select(d => (d.Id, d.Applicant.Bad)), "2026-07-01");
        using var request = new HttpRequestMessage(HttpMethod.Get, $"{MonitoredLender.Reports}/comparison");
        request.Headers.Accept.ParseAdd("text/csv");

        var response = await lender.Analyst.SendAsync(request);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var lines = (await response.Content.ReadAsStringAsync()).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(3, lines.Length);
        Assert.StartsWith("1,champion,", lines[1], StringComparison.Ordinal);
        Assert.StartsWith("2,challenger,", lines[2], StringComparison.Ordinal);
    }
}
