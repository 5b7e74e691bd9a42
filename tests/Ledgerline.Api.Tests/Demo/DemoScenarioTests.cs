using System.Net.Http.Headers;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Demo;

public sealed class DemoScenarioTests
{
    [Fact]
    public async Task Demo_EmptyDatabase_LoadsPlanDecisionsAndBothMaturedAndImmatureCohorts()
    {
        var key = "ll_demo-test-" + Guid.NewGuid().ToString("N");
        await using var app = DemoApp(key, 600);
        using var client = await ReadyClientAsync(app, key);

        using var plan = JsonDocument.Parse(await client.GetStringAsync("/scorecards/personal-loan-application/traffic"));
        using var maturity = JsonDocument.Parse(await client.GetStringAsync("/scorecards/personal-loan-application/maturity"));

        Assert.Equal(1, plan.RootElement.GetProperty("champion").GetInt32());
        Assert.Equal(2, plan.RootElement.GetProperty("challengers")[0].GetProperty("version").GetInt32());
        Assert.Equal(0.2m, plan.RootElement.GetProperty("challengers")[0].GetProperty("share").GetDecimal());
        Assert.Equal(3, plan.RootElement.GetProperty("shadows")[0].GetInt32());
        Assert.Equal(600, app.CountRows("Decisions"));
        var versions = maturity.RootElement.GetProperty("versions").EnumerateArray().ToList();
        Assert.True(versions.Sum(v => v.GetProperty("matured").GetInt32()) > 0, "no cohort has matured");
        Assert.True(versions.Sum(v => v.GetProperty("immature").GetInt32()) > 0, "no cohort is still immature");
    }

    [Fact]
    public async Task Demo_SameSeedAndDay_GivesTheSameApplicationsAndScores()
    {
        // Which arm decides comes from the plan's salt, which the service draws itself; every version's score does not depend on it.
        var first = await ScoresOfAsync("TL-000123");
        var second = await ScoresOfAsync("TL-000123");

        Assert.Equal(first, second);
    }

    private static async Task<string> ScoresOfAsync(string applicationId)
    {
        var key = "ll_demo-test-" + Guid.NewGuid().ToString("N");
        await using var app = DemoApp(key, 300);
        using var client = await ReadyClientAsync(app, key);
        using var record = JsonDocument.Parse(await client.GetStringAsync($"/scorecards/personal-loan-application/decisions/{applicationId}"));
        var root = record.RootElement;
        var scores = root.GetProperty("otherScores").EnumerateArray().Select(s => (Version: s.GetProperty("version").GetInt32(), Score: s.GetProperty("score").GetDecimal()))
            .Append((Version: root.GetProperty("version").GetInt32(), Score: root.GetProperty("score").GetDecimal()))
            .OrderBy(s => s.Version);
        return root.GetProperty("applicationDate").GetString() + " " + string.Join(", ", scores.Select(s => $"v{s.Version}={s.Score}"));
    }

    private static LedgerlineApp DemoApp(string key, int applications) => new(new Dictionary<string, string?>
    {
        ["Demo:Enabled"] = "true",
        ["Demo:Applications"] = applications.ToString(System.Globalization.CultureInfo.InvariantCulture),
        ["Demo:Key"] = key,
    });

    private static async Task<HttpClient> ReadyClientAsync(LedgerlineApp app, string key)
    {
        var client = app.CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", key);
        var deadline = DateTime.UtcNow.AddSeconds(60);
        while (!(await client.GetAsync("/health")).IsSuccessStatusCode)
        {
            Assert.True(DateTime.UtcNow < deadline, "the demo did not finish loading within 60 s");
            await Task.Delay(200);
        }

        return client;
    }
}
