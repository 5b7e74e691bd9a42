using System.Net;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Overview;

public sealed class OverviewEndpointTests
{
    private const string Path = "/scorecards/personal-loan-application/reports/overview";

    [Fact]
    public async Task GetOverview_BrowserOnScorecardWithoutDecisions_AnswersSelfContainedHtml()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        using var request = new HttpRequestMessage(HttpMethod.Get, Path);
        request.Headers.Accept.ParseAdd("text/html,application/xhtml+xml;q=0.9,*/*;q=0.8");

        using var response = await analyst.SendAsync(request);
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/html", response.Content.Headers.ContentType!.MediaType);
        Assert.Contains("default-src 'none'", response.Headers.GetValues("Content-Security-Policy").Single(), StringComparison.Ordinal);
        Assert.StartsWith("<!DOCTYPE html>", html, StringComparison.Ordinal);
        Assert.Contains("data-chart=\"roc\"", html, StringComparison.Ordinal);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("src=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<link", html, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public async Task GetOverview_NameWithMarkup_IsEncoded()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        var response = await analyst.PostAsJsonAsync("/scorecards", new
        {
            key = "personal-loan-application",
            name = "Loans <script>alert('x')</script> & more",
            outcomeDefinition = new { badDaysPastDue = 90, indeterminateDaysPastDue = 30, performanceWindowMonths = 12 },
        });
        response.EnsureSuccessStatusCode();

        var html = await analyst.GetStringAsync(Path);

        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("Loans &lt;script&gt;", html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task GetOverview_JsonOnlyClient_Answers406NamingTheJsonReports()
    {
        await using var app = new LedgerlineApp();
        using var risk = await app.ClientWithRolesAsync("risk");
        using var request = new HttpRequestMessage(HttpMethod.Get, Path);
        request.Headers.Accept.Add(new MediaTypeWithQualityHeaderValue("application/json"));

        using var response = await risk.SendAsync(request);

        await response.AssertProblemAsync(HttpStatusCode.NotAcceptable, "text/html", "/reports/performance");
    }

    [Fact]
    public async Task GetOverview_UnknownScorecard_Answers404()
    {
        await using var app = new LedgerlineApp();
        using var risk = await app.ClientWithRolesAsync("risk");

        using var response = await risk.GetAsync("/scorecards/no-such-card/reports/overview");

        await response.AssertProblemAsync(HttpStatusCode.NotFound, "no-such-card");
    }

    [Fact]
    public async Task GetOverview_ScoringKey_Answers403()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        using var scoring = await app.ClientWithRolesAsync("scoring");

        using var response = await scoring.GetAsync(Path);

        Assert.Equal(HttpStatusCode.Forbidden, response.StatusCode);
    }

    [Fact]
    public async Task GetOverview_BadDate_Answers400NamingTheParameter()
    {
        await using var app = new LedgerlineApp();
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);

        using var response = await analyst.GetAsync(Path + "?from=2026-13-01");

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "from");
    }
}
