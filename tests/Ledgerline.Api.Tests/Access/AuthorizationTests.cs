using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Access;

/// <summary>
/// OWASP API Security Top 10 (2023): API1 object-level, API3 object-property-level and API5
/// function-level authorisation, and the four-eyes rule on approval.
/// </summary>
public sealed class AuthorizationTests
{
    private const string OtherKey = "card-application";

    [Fact]
    public async Task ApproveVersion_ScoringKey_Answers403NamingTheRole()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        using var scoring = await app.ClientWithRolesAsync("scoring");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        var audit = app.CountRows("AuditEntries");

        var response = await scoring.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null);

        await response.AssertProblemAsync(HttpStatusCode.Forbidden, "risk", "scoring");
        Assert.Equal(audit, app.CountRows("AuditEntries"));
    }

    [Fact]
    public async Task CreateScorecard_AdminKey_Answers403BecauseAdminIsNoSuperuser()
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();

        var response = await admin.PostAsJsonAsync("/scorecards", Scenario.Family());

        await response.AssertProblemAsync(HttpStatusCode.Forbidden, "analyst");
        Assert.Equal(0, app.CountRows("Scorecards"));
    }

    [Fact]
    public async Task ApproveVersion_KeyThatRegisteredIt_Answers403FourEyes()
    {
        await using var app = new LedgerlineApp();
        using var author = await app.ClientWithRolesAsync("analyst", "risk");
        await Scenario.CreateFamilyAsync(author);
        await Scenario.RegisterAsync(author, Scenario.Version());
        await AttachBaselineAsync(author);

        var response = await author.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null);

        await response.AssertProblemAsync(HttpStatusCode.Forbidden, "four-eyes");
        var version = await author.GetFromJsonAsync<JsonElement>($"/scorecards/{Scenario.Key}/versions/1");
        Assert.Equal("draft", version.GetProperty("status").GetString());
    }

    [Fact]
    public async Task ApproveVersion_SecondPerson_ApprovesAndRecordsWhoInTheAuditTrail()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        var (riskId, riskSecret) = await app.CreateKeyAsync(new { name = "risk manager", roles = new List<string> { "risk" } });
        using var risk = app.ClientWithKey(riskSecret);
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        await AttachBaselineAsync(analyst);

        var response = await risk.PostAsync($"/scorecards/{Scenario.Key}/versions/1/approval", null);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var body = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal(riskId.ToString(), body.GetProperty("approvedBy").GetString());
        var audit = await risk.GetFromJsonAsync<JsonElement>("/audit?action=version.approved");
        var entry = Assert.Single(audit.GetProperty("entries").EnumerateArray());
        Assert.Equal(riskId.ToString(), entry.GetProperty("actor").GetString());
        Assert.Equal($"{Scenario.Key}/versions/1", entry.GetProperty("subject").GetString());
    }

    [Fact]
    public async Task ScorecardRoutes_KeyLimitedToAnotherScorecard_Answer404AndListOnlyItsOwn()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.CreateFamilyAsync(analyst, OtherKey);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        var (_, limitedSecret) = await app.CreateKeyAsync(new { name = "cards team", roles = new List<string> { "analyst", "risk" }, scorecards = new[] { OtherKey } });
        using var limited = app.ClientWithKey(limitedSecret);

        var family = await limited.GetAsync($"/scorecards/{Scenario.Key}");
        var versions = await limited.GetAsync($"/scorecards/{Scenario.Key}/versions");
        var version = await limited.GetAsync($"/scorecards/{Scenario.Key}/versions/1");
        var register = await limited.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(Scenario.Version()));
        var list = await limited.GetFromJsonAsync<JsonElement>("/scorecards");
        var own = await limited.GetAsync($"/scorecards/{OtherKey}");

        await family.AssertProblemAsync(HttpStatusCode.NotFound, Scenario.Key);
        await versions.AssertProblemAsync(HttpStatusCode.NotFound);
        await version.AssertProblemAsync(HttpStatusCode.NotFound);
        await register.AssertProblemAsync(HttpStatusCode.NotFound);
        Assert.Equal([OtherKey], list.EnumerateArray().Select(s => s.GetProperty("key").GetString()));
        Assert.Equal(HttpStatusCode.OK, own.StatusCode);
        Assert.Equal(1, app.CountRows("Versions"));
    }

    [Theory]
    [InlineData("version", "7")]
    [InlineData("status", "\"approved\"")]
    [InlineData("contentHash", "\"0000000000000000000000000000000000000000000000000000000000000000\"")]
    [InlineData("registeredBy", "\"someone-else\"")]
    public async Task RegisterVersion_ClientSetsServerOwnedField_Answers400AndStoresNothing(string field, string value)
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        var body = Scenario.Version();
        body[field] = JsonNode.Parse(value);
        var audit = app.CountRows("AuditEntries");

        var response = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(body));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, field, "not a field this request takes");
        Assert.Equal(0, app.CountRows("Versions"));
        Assert.Equal(audit, app.CountRows("AuditEntries"));
    }

    [Theory]
    [InlineData("id", "\"0195a1b2-0000-7000-8000-000000000000\"")]
    [InlineData("createdBy", "\"configuration\"")]
    [InlineData("revokedAt", "null")]
    [InlineData("secretHash", "\"00\"")]
    public async Task CreateKey_ClientSetsServerOwnedField_Answers400AndStoresNothing(string field, string value)
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();
        var body = JsonNode.Parse("""{ "name": "origination-eu", "roles": ["scoring"] }""")!.AsObject();
        body[field] = JsonNode.Parse(value);

        var response = await admin.PostAsync("/access/keys", Scenario.Json(body));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, field, "not a field this request takes");
        Assert.Equal(1, app.CountRows("ApiKeys"));
    }

    [Fact]
    public async Task CreateKey_UnknownRole_Answers400NamingTheRoles()
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();

        var response = await admin.PostAsync("/access/keys", Scenario.Json("""{ "name": "x", "roles": ["superuser"] }"""));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "superuser", "scoring, outcomes, analyst, risk, admin");
        Assert.Equal(1, app.CountRows("ApiKeys"));
    }

    private static async Task AttachBaselineAsync(HttpClient analyst)
    {
        var records = new JsonArray();
        foreach (var (months, status) in new[] { (3, "tenant"), (20, "owner"), (60, "mortgage"), (30, "with-family"), (10, "owner"), (70, "tenant") })
        {
            records.Add(new JsonObject { ["characteristics"] = new JsonObject { ["monthsAtAddress"] = months, ["residentialStatus"] = status } });
        }

        var response = await analyst.PutAsync($"/scorecards/{Scenario.Key}/versions/1/baseline", Scenario.Json(new JsonObject { ["records"] = records }));
        Assert.True(response.IsSuccessStatusCode, await response.Content.ReadAsStringAsync());
    }
}
