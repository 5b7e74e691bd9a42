using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
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
        var body = await response.Content.ReadFromJsonAsync<JsonElement>();
        Assert.Equal(1, body.GetProperty("version").GetInt32());
        Assert.Equal("draft", body.GetProperty("status").GetString());
        Assert.Matches("^[0-9a-f]{64}$", body.GetProperty("contentHash").GetString());
    }
}
