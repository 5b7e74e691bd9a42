using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Ledgerline.Api.Tests.Decisions;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Outcomes;

public sealed class MaturityTests
{
    private static string MaturityPath => $"/scorecards/{Scenario.Key}/maturity";

    [Fact]
    public async Task Maturity_MixedOutcomes_CountsEachClassOnlyOnceMatured()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-BAD", "APP-GOOD", "APP-IND", "APP-YOUNG", "APP-NONE");
        await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(
            new { applicationId = "APP-BAD", observedAt = "2025-09-01", worstDaysPastDue = 90 },
            new { applicationId = "APP-GOOD", observedAt = "2026-03-15", worstDaysPastDue = 29 },
            new { applicationId = "APP-IND", observedAt = "2026-04-01", worstDaysPastDue = 30, status = "indeterminate" },
            new { applicationId = "APP-YOUNG", observedAt = "2026-03-14", worstDaysPastDue = 0 }));

        var body = await setup.Live.Risk.GetFromJsonAsync<JsonElement>(MaturityPath);

        var versions = body.GetProperty("versions").EnumerateArray().ToList();
        int Sum(string field) => versions.Sum(v => v.GetProperty(field).GetInt32());
        Assert.Equal(5, Sum("decided"));
        Assert.Equal(4, Sum("withOutcome"));
        Assert.Equal(3, Sum("matured"));
        Assert.Equal(1, Sum("bad"));
        Assert.Equal(1, Sum("good"));
        Assert.Equal(1, Sum("indeterminate"));
        Assert.Equal(2, Sum("immature"));
        Assert.Equal(2, Sum("windowEndedAwaitingOutcome"));
        Assert.All(versions, v => Assert.False(v.TryGetProperty("nextMaturityDate", out _)));
        Assert.All(versions, v => Assert.Matches("^(champion|challenger)$", v.GetProperty("role").GetString()));
    }

    [Fact]
    public async Task Maturity_DecisionDatedToday_NextMaturityDateIsItsWindowEnd()
    {
        await using var app = new LedgerlineApp();
        var live = await LiveScoringSetup.WithPlanAsync(app);
        var application = LiveScoringSetup.Application("APP-NEW");
        application.Remove("applicationDate");
        var decided = await LiveScoringSetup.BodyAsync(await live.DecideAsync(application));
        var record = await live.Scoring.GetFromJsonAsync<JsonElement>($"{LiveScoringSetup.DecisionsPath}/APP-NEW");
        var applicationDate = DateOnly.Parse(record.GetProperty("applicationDate").GetString()!, System.Globalization.CultureInfo.InvariantCulture);

        var body = await live.Analyst.GetFromJsonAsync<JsonElement>(MaturityPath);

        var entry = Assert.Single(body.GetProperty("versions").EnumerateArray());
        Assert.Equal(decided.GetProperty("version").GetInt32(), entry.GetProperty("version").GetInt32());
        Assert.Equal(1, entry.GetProperty("immature").GetInt32());
        Assert.Equal(0, entry.GetProperty("windowEndedAwaitingOutcome").GetInt32());
        Assert.Equal(applicationDate.AddMonths(12).ToString("yyyy-MM-dd", System.Globalization.CultureInfo.InvariantCulture), entry.GetProperty("nextMaturityDate").GetString());
    }

    [Fact]
    public async Task Maturity_OutcomesKey_IsForbidden()
    {
        await using var app = new LedgerlineApp();
        using var servicing = await app.ClientWithRolesAsync("outcomes");

        var response = await servicing.GetAsync(MaturityPath);

        Assert.Equal(HttpStatusCode.Forbidden, response.StatusCode);
    }

    [Fact]
    public async Task Maturity_UnknownScorecard_Answers404()
    {
        await using var app = new LedgerlineApp();
        using var risk = await app.ClientWithRolesAsync("risk");

        var response = await risk.GetAsync("/scorecards/no-such-card/maturity");

        await response.AssertProblemAsync(HttpStatusCode.NotFound, "no-such-card");
    }
}
