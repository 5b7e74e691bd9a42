using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Scorecards;

public sealed class GermanCreditRegistryTests
{
    [Fact]
    public async Task TryVersion_EveryGermanCreditApplication_GivesItsExpectedScore()
    {
        // Expected scores computed independently in Python from german-credit-scorecard.json.
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst, "german-credit");
        var version = await Scenario.RegisterAsync(analyst, GermanCredit.Version(), "german-credit");

        foreach (var application in GermanCredit.Applications())
        {
            var response = await analyst.PostAsJsonAsync($"/scorecards/german-credit/versions/{version}/score", new { characteristics = application.Characteristics });
            var body = await response.Content.ReadFromJsonAsync<JsonElement>();
            Assert.True(response.IsSuccessStatusCode, body.ToString());
            Assert.True(application.ExpectedScore == body.GetProperty("score").GetDecimal(), $"row {application.Row}: {body}");
        }

        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task PutBaseline_GermanCreditSampleWithOutcomes_KeepsDevelopmentFiguresMatchingPRocAndScipy()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst, "german-credit");
        var version = await Scenario.RegisterAsync(analyst, GermanCredit.Version(), "german-credit");

        var response = await analyst.PutAsync($"/scorecards/german-credit/versions/{version}/baseline", Scenario.Json(GermanCredit.Baseline()));

        var body = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.True(response.IsSuccessStatusCode, body.ToString());
        var aggregates = body.GetProperty("aggregates");
        Assert.Equal(1000, aggregates.GetProperty("sampleSize").GetInt64());
        Assert.Equal(300, aggregates.GetProperty("bads").GetInt64());
        var discrimination = aggregates.GetProperty("discrimination");
        // german-credit-scorecard.md: AUC by R 4.2.2 / pROC 1.18.0 (equal to scipy 1.10.1 Mann–Whitney U / (n_good·n_bad));
        // Gini = 2·AUC − 1; KS by scipy 1.10.1 ks_2samp, peaking at score 530.
        Assert.Equal(0.7754380952, discrimination.GetProperty("auc").GetDouble(), 1e-9);
        Assert.Equal(0.5508761905, discrimination.GetProperty("gini").GetDouble(), 1e-9);
        Assert.Equal(0.4328571429, discrimination.GetProperty("ks").GetDouble(), 1e-9);
        Assert.Equal(530m, discrimination.GetProperty("ksScore").GetDecimal());
        // pROC ci.auc(method = "delong"): 0.7442274641 – 0.8066487263, so SE = (upper − lower) / (2 · 1.959964).
        var standardError = (0.8066487263 - 0.7442274641) / (2 * 1.959963984540054);
        Assert.Equal(standardError * standardError, discrimination.GetProperty("aucVariance").GetDouble(), 1e-9);
        var bins = aggregates.GetProperty("scoreBins");
        Assert.Equal(1000, bins.EnumerateArray().Sum(b => b.GetProperty("count").GetInt64()));
        Assert.Equal("deciles", aggregates.GetProperty("edgeRule").GetString());
        // The sample rows are aggregated, not kept: one baseline row, no decisions.
        Assert.Equal(1, app.CountRows("Baselines"));
        Assert.Equal(0, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task PutBaseline_RecordsThatFailToScore_Answers400ListingThemByIndexAndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst, "german-credit");
        var version = await Scenario.RegisterAsync(analyst, GermanCredit.Version(), "german-credit");
        var baseline = GermanCredit.Baseline();
        baseline["records"]![3]!["characteristics"]!["checkingAccount"] = "overdrawn";
        baseline["records"]![7]!["characteristics"]!["duration"] = "long";

        var response = await analyst.PutAsync($"/scorecards/german-credit/versions/{version}/baseline", Scenario.Json(baseline));

        var problem = await response.AssertProblemAsync(HttpStatusCode.BadRequest, "'overdrawn'");
        var errors = problem.GetProperty("errors");
        Assert.True(errors.TryGetProperty("records[3].characteristics.checkingAccount", out _), errors.ToString());
        Assert.True(errors.TryGetProperty("records[7].characteristics.duration", out _), errors.ToString());
        Assert.Equal(0, app.CountRows("Baselines"));
    }

    [Fact]
    public async Task PutBaseline_OutcomesOnSomeRecordsOnly_Answers400()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst, "german-credit");
        var version = await Scenario.RegisterAsync(analyst, GermanCredit.Version(), "german-credit");
        var baseline = GermanCredit.Baseline();
        baseline["records"]![0]!.AsObject().Remove("bad");

        var response = await analyst.PutAsync($"/scorecards/german-credit/versions/{version}/baseline", Scenario.Json(baseline));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "every record or on none");
        Assert.Equal(0, app.CountRows("Baselines"));
    }
}
