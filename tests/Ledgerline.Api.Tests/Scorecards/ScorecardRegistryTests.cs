using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Scorecards;

public sealed class ScorecardRegistryTests
{
    [Fact]
    public async Task RegisterVersion_NewContent_Answers201WithDraftAndHash()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);

        var response = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(Scenario.Version()));

        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        Assert.Equal($"/scorecards/{Scenario.Key}/versions/1", response.Headers.Location?.OriginalString);
        var body = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal(1, body.GetProperty("version").GetInt32());
        Assert.Equal("draft", body.GetProperty("status").GetString());
        Assert.Matches("^[0-9a-f]{64}$", body.GetProperty("contentHash").GetString());
    }

    [Fact]
    public async Task RegisterVersion_SameContentWithOtherKeyOrderAndNumberFormatting_Answers200WithExistingVersion()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        var first = await (await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(Scenario.Version()))).Content.ReadFromJsonAsync<JsonElement>();

        // The same table written differently: keys reordered, 600 as 600.00, 38 as 38.0.
        var reordered = """
            { "decisionBands": [ { "decision": "approve", "minScore": 120.0 }, { "minScore": 100, "decision": "refer" }, { "decision": "decline" } ],
              "characteristics": [
                { "type": "numeric", "name": "monthsAtAddress", "reasonText": "Short time at current address", "reasonCode": "A01",
                  "missingPoints": 45.00, "bins": [ { "points": 38.0, "upTo": 12 }, { "upTo": 48, "from": 12, "points": 52 }, { "points": 71, "from": 48 } ] },
                { "otherPoints": 48, "name": "residentialStatus", "type": "categorical", "reasonCode": "A02", "reasonText": "Residential status",
                  "bins": [ { "points": 70, "values": ["mortgage", "owner"] }, { "values": ["tenant"], "points": 48 }, { "values": ["with-family"], "points": 55 } ] } ],
              "reasonCodeCount": 4,
              "scaling": { "pointsToDoubleOdds": 20, "baseOdds": 50.0, "baseScore": 600.00 },
              "basePoints": 0.0,
              "description": "Rebuilt on 2026 applications; adds card utilisation" }
            """;
        var again = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(reordered));

        Assert.Equal(HttpStatusCode.OK, again.StatusCode);
        var body = await again.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal(1, body.GetProperty("version").GetInt32());
        Assert.Equal(first.GetProperty("contentHash").GetString(), body.GetProperty("contentHash").GetString());
        Assert.Equal(1, app.CountRows("Versions"));
    }

    [Fact]
    public async Task RegisterVersion_ChangedContent_GetsNextNumber()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        var changed = Scenario.Version();
        changed["basePoints"] = 5;

        Assert.Equal(2, await Scenario.RegisterAsync(analyst, changed));
    }

    [Fact]
    public async Task GetVersion_Registered_ReturnsLifecycleAndPointsTable()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());

        var version = await analyst.GetFromJsonAsync<JsonElement>($"/scorecards/{Scenario.Key}/versions/1");
        var list = await analyst.GetFromJsonAsync<JsonElement>($"/scorecards/{Scenario.Key}/versions");
        var family = await analyst.GetFromJsonAsync<JsonElement>($"/scorecards/{Scenario.Key}");

        Assert.Equal("draft", version.GetProperty("status").GetString());
        Assert.False(version.GetProperty("hasBaseline").GetBoolean());
        var characteristics = version.GetProperty("content").GetProperty("characteristics");
        Assert.Equal("monthsAtAddress", characteristics[0].GetProperty("name").GetString());
        Assert.Equal(12, characteristics[0].GetProperty("bins")[1].GetProperty("from").GetDecimal());
        Assert.Equal(1, list.GetArrayLength());
        Assert.Equal(90, family.GetProperty("outcomeDefinition").GetProperty("badDaysPastDue").GetInt32());
        Assert.Equal(1, family.GetProperty("versions").GetArrayLength());
    }

    [Fact]
    public async Task CreateScorecard_ExistingKey_Answers409AndKeepsTheFirst()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);

        var again = await analyst.PostAsJsonAsync("/scorecards", Scenario.Family());

        await again.AssertProblemAsync(HttpStatusCode.Conflict, Scenario.Key);
        Assert.Equal(1, app.CountRows("Scorecards"));
    }

    [Theory]
    [InlineData("Personal Loans", "URL-safe slug")]
    [InlineData("personal--loans", "URL-safe slug")]
    [InlineData("", "key")]
    public async Task CreateScorecard_KeyNotASlug_Answers400AndStoresNothing(string key, string mention)
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");

        var response = await analyst.PostAsJsonAsync("/scorecards", Scenario.Family(key));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "\"key\"", mention);
        Assert.Equal(0, app.CountRows("Scorecards"));
    }

    [Fact]
    public async Task CreateScorecard_IndeterminateNotBelowBad_Answers400()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");

        var response = await analyst.PostAsJsonAsync("/scorecards", new
        {
            key = "cards",
            name = "Cards",
            outcomeDefinition = new { badDaysPastDue = 60, indeterminateDaysPastDue = 60, performanceWindowMonths = 12 },
        });

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "outcomeDefinition.indeterminateDaysPastDue");
        Assert.Equal(0, app.CountRows("Scorecards"));
    }

    [Fact]
    public async Task Health_MigratedDatabase_Answers200WithoutAKey()
    {
        await using var app = new LedgerlineApp();
        using var anonymous = app.CreateClient();

        var response = await anonymous.GetAsync("/health");

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
    }

#if !POSTGRES
    [Fact]
    public async Task Database_AfterStart_RunsInWalMode()
    {
        await using var app = new LedgerlineApp();
        using var anonymous = app.CreateClient();
        await anonymous.GetAsync("/health");

        using var connection = app.OpenDatabase();
        using var command = connection.CreateCommand();
        command.CommandText = "PRAGMA journal_mode";

        Assert.Equal("wal", command.ExecuteScalar() as string);
    }
#endif

    [Fact]
    public async Task UnknownScorecardOrVersion_Answers404NamingWhatIsMissing()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);

        await (await analyst.GetAsync("/scorecards/no-such-card")).AssertProblemAsync(HttpStatusCode.NotFound, "no-such-card");
        await (await analyst.GetAsync($"/scorecards/{Scenario.Key}/versions/7")).AssertProblemAsync(HttpStatusCode.NotFound, "no version 7");
        await (await analyst.PostAsync("/scorecards/no-such-card/versions", Scenario.Json(Scenario.Version())))
            .AssertProblemAsync(HttpStatusCode.NotFound, "no-such-card");
        Assert.Equal(0, app.CountRows("Versions"));
    }

    [Fact]
    public async Task RegisterVersion_ServerOwnedFieldsInBody_Answers400()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        var version = Scenario.Version();
        version["version"] = 9;
        version["status"] = "approved";

        var response = await analyst.PostAsync($"/scorecards/{Scenario.Key}/versions", Scenario.Json(version));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "not a field this request takes");
        Assert.Equal(0, app.CountRows("Versions"));
    }

    internal static JsonObject Characteristic(JsonObject version, int index) => version["characteristics"]![index]!.AsObject();
}
