using System.Net.Http.Json;
using System.Text;
using System.Text.Json;
using Ledgerline.Api.Tests.Decisions;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Outcomes;

/// <summary>
/// Live decisions of the invented lender made through HTTP (see <see cref="LiveScoringSetup"/>),
/// plus a key for the servicing system that posts outcomes. Applications are dated 15 March 2025,
/// so with the family's 12-month window the window end (its last day) is 15 March 2026, in the past.
/// </summary>
public sealed class OutcomeSetup
{
    public const string ApplicationDate = "2025-03-15";
    public const string WindowEnd = "2026-03-15";

    private OutcomeSetup(LiveScoringSetup live, HttpClient servicing)
    {
        Live = live;
        Servicing = servicing;
    }

    public LiveScoringSetup Live { get; }

    public HttpClient Servicing { get; }

    public static string OutcomesPath => $"/scorecards/{Scenario.Key}/outcomes";

    /// <summary>Decides each application id through POST …/decisions.</summary>
    public static async Task<OutcomeSetup> WithDecisionsAsync(LedgerlineApp app, params string[] applicationIds)
    {
        var live = await LiveScoringSetup.WithPlanAsync(app);
        foreach (var id in applicationIds)
        {
            var application = LiveScoringSetup.Application(id);
            application["applicationDate"] = ApplicationDate;
            var response = await live.DecideAsync(application);
            Assert.True(response.IsSuccessStatusCode, await response.Content.ReadAsStringAsync());
        }

        return new OutcomeSetup(live, await app.ClientWithRolesAsync("outcomes"));
    }

    public Task<HttpResponseMessage> PostJsonAsync(string body, string query = "") =>
        Servicing.PostAsync(OutcomesPath + query, Scenario.Json(body));

    public Task<HttpResponseMessage> PostRowsAsync(params object[] rows) =>
        Servicing.PostAsJsonAsync(OutcomesPath, new { outcomes = rows });

    public Task<HttpResponseMessage> PostCsvAsync(string csv) =>
        Servicing.PostAsync(OutcomesPath, new StringContent(csv, Encoding.UTF8, "text/csv"));

    /// <summary>The <c>outcome</c> part of GET …/decisions/{applicationId}.</summary>
    public async Task<JsonElement> OutcomeOfAsync(string applicationId)
    {
        var record = await Live.Scoring.GetFromJsonAsync<JsonElement>($"{LiveScoringSetup.DecisionsPath}/{applicationId}");
        return record.TryGetProperty("outcome", out var outcome) ? outcome : default;
    }

    public static async Task<JsonElement> OkBodyAsync(HttpResponseMessage response)
    {
        var text = await response.Content.ReadAsStringAsync();
        Assert.True(response.IsSuccessStatusCode, text);
        return JsonDocument.Parse(text).RootElement;
    }
}
