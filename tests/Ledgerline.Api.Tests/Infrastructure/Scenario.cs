using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>
/// Invented fixtures: a lender called Harbour Lane Credit and its personal-loan scorecard. Used
/// by API tests that need a family and a version to exist.
/// </summary>
public static class Scenario
{
    public const string Key = "personal-loan-application";

    public static object Family(string key = Key) => new
    {
        key,
        name = "Personal loans, new applicants (Harbour Lane Credit)",
        outcomeDefinition = new { badDaysPastDue = 90, indeterminateDaysPastDue = 30, performanceWindowMonths = 12 },
    };

    /// <summary>The contract's example points table, as a mutable JSON tree so tests can break it.</summary>
    public static JsonObject Version() => JsonNode.Parse("""
        {
          "description": "Rebuilt on 2026 applications; adds card utilisation",
          "basePoints": 0,
          "scaling": { "baseScore": 600, "baseOdds": 50, "pointsToDoubleOdds": 20 },
          "reasonCodeCount": 4,
          "characteristics": [
            { "name": "monthsAtAddress", "type": "numeric", "reasonCode": "A01",
              "reasonText": "Short time at current address",
              "bins": [ { "upTo": 12, "points": 38 },
                        { "from": 12, "upTo": 48, "points": 52 },
                        { "from": 48, "points": 71 } ],
              "missingPoints": 45 },
            { "name": "residentialStatus", "type": "categorical", "reasonCode": "A02",
              "reasonText": "Residential status",
              "bins": [ { "values": ["owner", "mortgage"], "points": 70 },
                        { "values": ["tenant"], "points": 48 },
                        { "values": ["with-family"], "points": 55 } ],
              "otherPoints": 48 }
          ],
          "decisionBands": [ { "minScore": 120, "decision": "approve" },
                             { "minScore": 100, "decision": "refer" },
                             { "decision": "decline" } ]
        }
        """)!.AsObject();

    public static async Task CreateFamilyAsync(HttpClient analyst, string key = Key)
    {
        var response = await analyst.PostAsJsonAsync("/scorecards", Family(key));
        response.EnsureSuccessStatusCode();
    }

    /// <summary>Registers a version and returns its number.</summary>
    public static async Task<int> RegisterAsync(HttpClient analyst, JsonObject version, string key = Key)
    {
        var response = await analyst.PostAsync($"/scorecards/{key}/versions", Json(version));
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, body);
        return JsonDocument.Parse(body).RootElement.GetProperty("version").GetInt32();
    }

    public static StringContent Json(JsonNode node) => new(node.ToJsonString(), System.Text.Encoding.UTF8, "application/json");

    public static StringContent Json(string text) => new(text, System.Text.Encoding.UTF8, "application/json");
}
