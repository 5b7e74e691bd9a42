using System.Net;
using System.Net.Http.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Http;

/// <summary>OWASP API Security Top 10 (2023), API4: unrestricted resource consumption.</summary>
public sealed class LimitsTests
{
    [Fact]
    public async Task CreateScorecard_BodyOverTheDefaultLimit_Answers413AndStoresNothing()
    {
        // LedgerlineApp runs real Kestrel: the in-memory test server does not enforce body size limits.
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        var huge = new string('x', 1024 * 1024 + 10);

        var response = await analyst.PostAsync("/scorecards", Scenario.Json($$"""{ "key": "big", "name": "{{huge}}" }"""));

        await response.AssertProblemAsync(HttpStatusCode.RequestEntityTooLarge, "1,048,576 bytes");
        Assert.Equal(0, app.CountRows("Scorecards"));
    }

    [Fact]
    public async Task Requests_OneKeyFloods_Answers429WithRetryAfterWhileOtherKeysAreServed()
    {
        await using var app = new LedgerlineApp(new Dictionary<string, string?>
        {
            ["Limits:PermitsPerSecond"] = "1",
            ["Limits:Burst"] = "3",
        });
        using var flooding = await app.ClientWithRolesAsync("analyst");
        using var other = await app.ClientWithRolesAsync("analyst");

        var answers = new List<HttpResponseMessage>();
        for (var i = 0; i < 12; i++)
        {
            answers.Add(await flooding.GetAsync("/scorecards"));
        }

        var refused = answers.Where(r => r.StatusCode == HttpStatusCode.TooManyRequests).ToList();
        Assert.NotEmpty(refused);
        await refused[0].AssertProblemAsync(HttpStatusCode.TooManyRequests, "retry after");
        Assert.True(refused[0].Headers.RetryAfter?.Delta >= TimeSpan.FromSeconds(1), "Retry-After must name whole seconds");
        Assert.Equal(HttpStatusCode.OK, (await other.GetAsync("/scorecards")).StatusCode);
    }

    [Fact]
    public async Task Requests_DefaultLimits_LetAThousandQuickRequestsThrough()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");

        var answers = await Task.WhenAll(Enumerable.Range(0, 1000).Select(_ => analyst.GetAsync("/health")));

        Assert.DoesNotContain(answers, r => r.StatusCode == HttpStatusCode.TooManyRequests);
    }

    [Fact]
    public async Task CreateKey_TooManyScorecards_Answers400()
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();

        var response = await admin.PostAsJsonAsync("/access/keys", new { name = "wide", roles = new List<string> { "analyst" }, scorecards = Enumerable.Range(0, 1000).Select(i => $"card-{i}") });

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "scorecards");
        Assert.Equal(1, app.CountRows("ApiKeys"));
    }
}
