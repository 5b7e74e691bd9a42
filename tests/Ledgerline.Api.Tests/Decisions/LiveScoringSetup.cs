using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Decisions;

/// <summary>
/// An invented lender (Harbour Lane Credit) with three approved versions: 1 the contract's table,
/// 2 a rebuild that adds card utilisation (with missing points), 3 a shadow candidate that needs
/// card utilisation and gives no missing points. Keys: analyst registers, risk approves and
/// sets the plan, scoring decides.
/// </summary>
public sealed class LiveScoringSetup
{
    private LiveScoringSetup(HttpClient analyst, HttpClient risk, HttpClient scoring)
    {
        Analyst = analyst;
        Risk = risk;
        Scoring = scoring;
    }

    public HttpClient Analyst { get; }

    public HttpClient Risk { get; }

    public HttpClient Scoring { get; }

    public static string DecisionsPath => $"/scorecards/{Scenario.Key}/decisions";

    public static string TrafficPath => $"/scorecards/{Scenario.Key}/traffic";

    /// <summary>Creates the family and approves versions 1–3; no plan yet.</summary>
    public static async Task<LiveScoringSetup> CreateAsync(LedgerlineApp app)
    {
        var setup = new LiveScoringSetup(
            await app.ClientWithRolesAsync("analyst"), await app.ClientWithRolesAsync("risk"), await app.ClientWithRolesAsync("scoring"));
        await Scenario.CreateFamilyAsync(setup.Analyst);
        foreach (var version in new[] { Scenario.Version(), Rebuild(), ShadowCandidate() })
        {
            var number = await Scenario.RegisterAsync(setup.Analyst, version);
            var baseline = await setup.Analyst.PutAsync($"/scorecards/{Scenario.Key}/versions/{number}/baseline", Scenario.Json(Baseline(withUtilisation: number > 1)));
            Assert.True(baseline.IsSuccessStatusCode, await baseline.Content.ReadAsStringAsync());
            var approval = await setup.Risk.PostAsync($"/scorecards/{Scenario.Key}/versions/{number}/approval", null);
            Assert.True(approval.IsSuccessStatusCode, await approval.Content.ReadAsStringAsync());
        }

        return setup;
    }

    /// <summary>Creates everything and sets a plan: champion 1, challenger 2 at the share given, shadow 3.</summary>
    public static async Task<LiveScoringSetup> WithPlanAsync(LedgerlineApp app, decimal challengerShare = 0.2m)
    {
        var setup = await CreateAsync(app);
        var plan = new JsonObject
        {
            ["champion"] = 1,
            ["challengers"] = new JsonArray(new JsonObject { ["version"] = 2, ["share"] = challengerShare }),
            ["shadows"] = new JsonArray(3),
            ["reason"] = "Challenger test of the 2026 rebuild",
        };
        var response = await setup.Risk.PutAsync(TrafficPath, Scenario.Json(plan));
        Assert.True(response.IsSuccessStatusCode, await response.Content.ReadAsStringAsync());
        return setup;
    }

    public static JsonObject Application(string applicationId, int monthsAtAddress = 30, string residentialStatus = "tenant") => new()
    {
        ["applicationId"] = applicationId,
        ["applicationDate"] = "2026-01-15",
        ["characteristics"] = new JsonObject { ["monthsAtAddress"] = monthsAtAddress, ["residentialStatus"] = residentialStatus },
    };

    public async Task<HttpResponseMessage> DecideAsync(JsonNode body, string? idempotencyKey = null)
    {
        using var message = new HttpRequestMessage(HttpMethod.Post, DecisionsPath) { Content = Scenario.Json(body) };
        if (idempotencyKey is not null)
        {
            message.Headers.Add("Idempotency-Key", idempotencyKey);
        }

        return await Scoring.SendAsync(message);
    }

    public static async Task<JsonElement> BodyAsync(HttpResponseMessage response) =>
        JsonDocument.Parse(await response.Content.ReadAsStringAsync()).RootElement;

    private static JsonObject Rebuild()
    {
        var version = Scenario.Version();
        version["description"] = "Rebuild with card utilisation";
        version["characteristics"]!.AsArray().Add(JsonNode.Parse("""
            { "name": "cardUtilisation", "type": "numeric", "reasonCode": "B01", "reasonText": "High card utilisation",
              "bins": [ { "upTo": 0.3, "points": 60 }, { "from": 0.3, "upTo": 0.7, "points": 40 }, { "from": 0.7, "points": 20 } ],
              "missingPoints": 35 }
            """));
        return version;
    }

    private static JsonObject ShadowCandidate()
    {
        var version = Rebuild();
        version["description"] = "Shadow candidate: utilisation required";
        version["characteristics"]![2]!.AsObject().Remove("missingPoints");
        version["characteristics"]![2]!["reasonCode"] = "B02";
        return version;
    }

    private static JsonObject Baseline(bool withUtilisation) => new()
    {
        ["records"] = new JsonArray(
            Record(5, "tenant", 0.9, true, withUtilisation), Record(30, "owner", 0.2, false, withUtilisation),
            Record(60, "mortgage", 0.5, false, withUtilisation), Record(10, "with-family", 0.8, true, withUtilisation),
            Record(50, "owner", 0.1, false, withUtilisation), Record(20, "tenant", 0.4, false, withUtilisation)),
    };

    private static JsonObject Record(int months, string status, double utilisation, bool bad, bool withUtilisation)
    {
        var characteristics = new JsonObject { ["monthsAtAddress"] = months, ["residentialStatus"] = status };
        if (withUtilisation)
        {
            characteristics["cardUtilisation"] = utilisation;
        }

        return new JsonObject { ["characteristics"] = characteristics, ["bad"] = bad };
    }
}
