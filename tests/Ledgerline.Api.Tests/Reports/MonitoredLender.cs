using System.Globalization;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Reports;

/// <summary>
/// An invented lender (Kestrel Bay Finance) monitoring a two-characteristic scorecard. Applicants
/// are drawn from an invented generating model with a fixed seed, so every run sees the same
/// traffic. Every version approves every score, so every application can carry an outcome.
/// </summary>
public sealed class MonitoredLender
{
    public const string Key = "kestrel-bay-personal";

    private MonitoredLender(HttpClient analyst, HttpClient risk, HttpClient scoring)
    {
        Analyst = analyst;
        Risk = risk;
        Scoring = scoring;
    }

    public HttpClient Analyst { get; }

    public HttpClient Risk { get; }

    public HttpClient Scoring { get; }

    public static string Reports => $"/scorecards/{Key}/reports";

    public static async Task<MonitoredLender> CreateAsync(LedgerlineApp app)
    {
        var lender = new MonitoredLender(await app.ClientWithRolesAsync("analyst"), await app.ClientWithRolesAsync("risk"), await app.ClientWithRolesAsync("scoring"));
        var family = await lender.Analyst.PostAsJsonAsync("/scorecards", new
        {
            key = Key,
            name = "Personal loans (Kestrel Bay Finance)",
            outcomeDefinition = new { badDaysPastDue = 90, indeterminateDaysPastDue = 30, performanceWindowMonths = 12 },
        });
        Assert.True(family.IsSuccessStatusCode, await family.Content.ReadAsStringAsync());
        return lender;
    }

    private static readonly int[] ChampionUtilisationPoints = [40, 25, 5];

    /// <summary>A lender whose plan holds one approved champion and nothing else.</summary>
    public static async Task<(MonitoredLender Lender, int Version)> ChampionOnlyAsync(LedgerlineApp app)
    {
        var lender = await CreateAsync(app);
        var version = await lender.AddApprovedVersionAsync(Version("Champion", ChampionUtilisationPoints));
        await lender.SetPlanAsync(version);
        return (lender, version);
    }

    /// <summary>
    /// A points table over monthsAtAddress and cardUtilisation. <paramref name="utilisationPoints"/>
    /// gives the points of the three utilisation bins (low, middle, high).
    /// </summary>
    public static JsonObject Version(string description, int[] utilisationPoints) => new()
    {
        ["description"] = description,
        ["basePoints"] = 500,
        ["scaling"] = new JsonObject { ["baseScore"] = 600, ["baseOdds"] = 50, ["pointsToDoubleOdds"] = 20 },
        ["characteristics"] = new JsonArray(
            JsonNode.Parse("""
                { "name": "monthsAtAddress", "type": "numeric", "reasonCode": "K01", "reasonText": "Short time at current address",
                  "bins": [ { "upTo": 12, "points": 10 }, { "from": 12, "upTo": 48, "points": 30 }, { "from": 48, "points": 50 } ],
                  "missingPoints": 20 }
                """),
            new JsonObject
            {
                ["name"] = "cardUtilisation",
                ["type"] = "numeric",
                ["reasonCode"] = "K02",
                ["reasonText"] = "High card utilisation",
                ["bins"] = new JsonArray(
                    new JsonObject { ["upTo"] = 0.3, ["points"] = utilisationPoints[0] },
                    new JsonObject { ["from"] = 0.3, ["upTo"] = 0.7, ["points"] = utilisationPoints[1] },
                    new JsonObject { ["from"] = 0.7, ["points"] = utilisationPoints[2] }),
                ["missingPoints"] = utilisationPoints[1],
            }),
        ["decisionBands"] = new JsonArray(new JsonObject { ["minScore"] = 0, ["decision"] = "approve" }, new JsonObject { ["decision"] = "decline" }),
    };

    /// <summary>Registers, attaches a baseline of <paramref name="baselineRows"/> unshifted applicants (with outcomes) and approves.</summary>
    public async Task<int> AddApprovedVersionAsync(JsonObject version, int baselineRows = 600, bool withBaseline = true)
    {
        var number = await Scenario.RegisterAsync(Analyst, version, Key);
        if (withBaseline)
        {
            var random = new Random(7);
            var records = new JsonArray();
            for (var i = 0; i < baselineRows; i++)
            {
                var applicant = Applicant.Draw(random, shifted: false);
                records.Add(new JsonObject { ["characteristics"] = applicant.Characteristics(), ["bad"] = applicant.Bad });
            }

            var baseline = await Analyst.PutAsync($"/scorecards/{Key}/versions/{number}/baseline", Scenario.Json(new JsonObject { ["records"] = records }));
            Assert.True(baseline.IsSuccessStatusCode, await baseline.Content.ReadAsStringAsync());
            var approval = await Risk.PostAsync($"/scorecards/{Key}/versions/{number}/approval", null);
            Assert.True(approval.IsSuccessStatusCode, await approval.Content.ReadAsStringAsync());
        }

        return number;
    }

    public async Task SetPlanAsync(int champion, int? challenger = null, double share = 0.5, int? shadow = null)
    {
        var plan = new JsonObject
        {
            ["champion"] = champion,
            ["challengers"] = challenger is { } c ? new JsonArray(new JsonObject { ["version"] = c, ["share"] = share }) : new JsonArray(),
            ["shadows"] = shadow is { } s ? new JsonArray(s) : new JsonArray(),
            ["reason"] = "Monitoring test plan",
        };
        var response = await Risk.PutAsync($"/scorecards/{Key}/traffic", Scenario.Json(plan));
        Assert.True(response.IsSuccessStatusCode, await response.Content.ReadAsStringAsync());
    }

    /// <summary>Decides <paramref name="count"/> applicants dated <paramref name="date"/> in batches; returns them with their ids.</summary>
    public async Task<List<(string ApplicationId, Applicant Applicant)>> DecideAsync(int count, string date, int seed, bool shifted = false, string prefix = "APP")
    {
        var random = new Random(seed);
        var decided = new List<(string, Applicant)>();
        for (var start = 0; start < count; start += 1000)
        {
            var batch = new JsonArray();
            for (var i = start; i < Math.Min(count, start + 1000); i++)
            {
                var id = string.Create(CultureInfo.InvariantCulture, $"{prefix}-{seed}-{i:000000}");
                var applicant = Applicant.Draw(random, shifted);
                decided.Add((id, applicant));
                batch.Add(new JsonObject { ["applicationId"] = id, ["applicationDate"] = date, ["characteristics"] = applicant.Characteristics() });
            }

            var response = await Scoring.PostAsync($"/scorecards/{Key}/decisions/batch", Scenario.Json(new JsonObject { ["applications"] = batch }));
            var body = await response.Content.ReadAsStringAsync();
            Assert.True(response.IsSuccessStatusCode, body);
            Assert.Equal(0, JsonDocument.Parse(body).RootElement.GetProperty("rejected").GetInt32());
        }

        return decided;
    }

    /// <summary>Posts each applicant's true outcome, observed on <paramref name="observedAt"/>, through the outcomes endpoint.</summary>
    public static async Task PostOutcomesAsync(HttpClient outcomes, string key, IEnumerable<(string ApplicationId, bool Bad)> truth, string observedAt)
    {
        foreach (var chunk in truth.Chunk(2000))
        {
            var rows = new JsonArray();
            foreach (var (id, bad) in chunk)
            {
                rows.Add(new JsonObject { ["applicationId"] = id, ["observedAt"] = observedAt, ["status"] = bad ? "bad" : "good" });
            }

            var response = await outcomes.PostAsync($"/scorecards/{key}/outcomes", Scenario.Json(new JsonObject { ["outcomes"] = rows }));
            var body = await response.Content.ReadAsStringAsync();
            Assert.True(response.IsSuccessStatusCode, body);
            Assert.Equal(chunk.Length, JsonDocument.Parse(body).RootElement.GetProperty("accepted").GetInt32());
        }
    }

    public static async Task<JsonElement> GetJsonAsync(HttpClient client, string path)
    {
        var response = await client.GetAsync(path);
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, body);
        Assert.DoesNotContain("NaN", body, StringComparison.Ordinal);
        Assert.DoesNotContain("Infinity", body, StringComparison.Ordinal);
        return JsonDocument.Parse(body).RootElement;
    }
}

/// <summary>
/// One invented applicant. Truth: the log-odds of going bad fall with time at address and rise
/// steeply with card utilisation, so a version that scores utilisation separates better.
/// Shifted applicants have moved house recently and run high utilisation.
/// </summary>
public sealed record Applicant(int MonthsAtAddress, double CardUtilisation, bool Bad)
{
    public static Applicant Draw(Random random, bool shifted)
    {
        var months = shifted ? random.Next(0, 12) : random.Next(0, 120);
        var utilisation = shifted ? 0.7 + (random.NextDouble() * 0.3) : random.NextDouble();
        var logOdds = -1.2 - (0.015 * months) + (3.0 * utilisation);
        var bad = random.NextDouble() < 1 / (1 + Math.Exp(-logOdds));
        return new Applicant(months, Math.Round(utilisation, 3), bad);
    }

    public JsonObject Characteristics() => new() { ["monthsAtAddress"] = MonthsAtAddress, ["cardUtilisation"] = CardUtilisation };
}
