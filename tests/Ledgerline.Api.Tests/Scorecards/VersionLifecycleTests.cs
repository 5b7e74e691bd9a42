using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Scorecards;

public sealed class VersionLifecycleTests
{
    private static async Task<(LedgerlineApp App, HttpClient Analyst, HttpClient Risk)> StartAsync()
    {
        var app = new LedgerlineApp();
        var analyst = await app.ClientWithRolesAsync("analyst");
        var risk = await app.ClientWithRolesAsync("risk");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        return (app, analyst, risk);
    }

    private static Task<HttpResponseMessage> AttachBaselineAsync(HttpClient analyst) =>
        analyst.PutAsJsonAsync($"/scorecards/{Scenario.Key}/versions/1/baseline", new
        {
            records = new[]
            {
                new { characteristics = new Dictionary<string, object?> { ["monthsAtAddress"] = 5, ["residentialStatus"] = "tenant" } },
                new { characteristics = new Dictionary<string, object?> { ["monthsAtAddress"] = 60, ["residentialStatus"] = "owner" } },
                new { characteristics = new Dictionary<string, object?> { ["monthsAtAddress"] = null, ["residentialStatus"] = "houseboat" } },
            },
        });

    [Fact]
    public async Task Approve_DraftWithoutBaseline_Answers409NamingTheFix()
    {
        var (app, analyst, risk) = await StartAsync();
        await using var hosted = app;

        var response = await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null);

        await response.AssertProblemAsync(HttpStatusCode.Conflict, "baseline");
        var version = await analyst.GetFromJsonAsync<JsonElement>($"/scorecards/{Scenario.Key}/versions/1");
        Assert.Equal("draft", version.GetProperty("status").GetString());
    }

    [Fact]
    public async Task Approve_ByTheKeyThatRegistered_Answers403FourEyes()
    {
        await using var app = new LedgerlineApp();
        using var both = await app.ClientWithRolesAsync("analyst", "risk");
        await Scenario.CreateFamilyAsync(both);
        await Scenario.RegisterAsync(both, Scenario.Version());
        (await AttachBaselineAsync(both)).EnsureSuccessStatusCode();

        var response = await both.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null);

        await response.AssertProblemAsync(HttpStatusCode.Forbidden, "four-eyes");
    }

    [Fact]
    public async Task Approve_WithBaselineBySecondPerson_BecomesApprovedAndBaselineIsFixed()
    {
        var (app, analyst, risk) = await StartAsync();
        await using var hosted = app;
        var baseline = await AttachBaselineAsync(analyst);
        Assert.Equal(HttpStatusCode.OK, baseline.StatusCode);
        var aggregates = (await baseline.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("aggregates");
        Assert.Equal(3, aggregates.GetProperty("sampleSize").GetInt64());
        Assert.Equal(1, aggregates.GetProperty("characteristics")[0].GetProperty("missing").GetInt64());
        Assert.Equal(1, aggregates.GetProperty("characteristics")[1].GetProperty("other").GetInt64());
        Assert.False(aggregates.TryGetProperty("discrimination", out _));

        var approved = await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null);

        Assert.Equal(HttpStatusCode.OK, approved.StatusCode);
        var body = await approved.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal("approved", body.GetProperty("status").GetString());
        Assert.NotEqual(body.GetProperty("registeredBy").GetString(), body.GetProperty("approvedBy").GetString());
        await (await AttachBaselineAsync(analyst)).AssertProblemAsync(HttpStatusCode.Conflict, "approved");
        await (await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null)).AssertProblemAsync(HttpStatusCode.Conflict, "only a draft");
    }

    [Fact]
    public async Task Retire_ApprovedVersion_BecomesRetiredAndCannotBeApproved()
    {
        var (app, analyst, risk) = await StartAsync();
        await using var hosted = app;
        (await AttachBaselineAsync(analyst)).EnsureSuccessStatusCode();
        (await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null)).EnsureSuccessStatusCode();

        var retired = await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/retirement", null);

        Assert.Equal("retired", (await retired.Content.ReadFromJsonAsync<JsonElement>()).GetProperty("status").GetString());
        await (await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/retirement", null)).AssertProblemAsync(HttpStatusCode.Conflict, "retired already");
        await (await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null)).AssertProblemAsync(HttpStatusCode.Conflict, "retired");
    }

    [Fact]
    public async Task Register_ThenApprove_VersionContentCannotBeEditedByAnyRoute()
    {
        var (app, analyst, risk) = await StartAsync();
        await using var hosted = app;
        var before = await analyst.GetFromJsonAsync<JsonElement>($"/scorecards/{Scenario.Key}/versions/1");

        var put = await analyst.PutAsync($"/scorecards/{Scenario.Key}/versions/1", Scenario.Json(Scenario.Version()));
        var patch = await analyst.PatchAsync($"/scorecards/{Scenario.Key}/versions/1", Scenario.Json(Scenario.Version()));

        // No route edits a version; the default-deny policy answers before the method check.
        Assert.Contains(put.StatusCode, new[] { HttpStatusCode.Forbidden, HttpStatusCode.MethodNotAllowed });
        Assert.Contains(patch.StatusCode, new[] { HttpStatusCode.Forbidden, HttpStatusCode.MethodNotAllowed });
        var after = await analyst.GetFromJsonAsync<JsonElement>($"/scorecards/{Scenario.Key}/versions/1");
        Assert.Equal(before.GetProperty("contentHash").GetString(), after.GetProperty("contentHash").GetString());
    }
}
