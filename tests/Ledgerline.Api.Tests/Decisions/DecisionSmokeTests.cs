using System.Net;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Decisions;

public sealed class DecisionSmokeTests
{
    [Fact]
    public async Task Decide_WithPlan_Answers201AndLogsOneDecisionWithEveryVersionScored()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var response = await setup.DecideAsync(LiveScoringSetup.Application("APP-0001234"));

        var body = await LiveScoringSetup.BodyAsync(response);
        Assert.True(response.StatusCode == HttpStatusCode.Created, body.ToString());
        Assert.Equal("APP-0001234", body.GetProperty("applicationId").GetString());
        Assert.Equal(1, body.GetProperty("planRevision").GetInt32());
        Assert.Equal(1, app.CountRows("Decisions"));
        Assert.Equal(3, app.CountRows("DecisionScores"));
        var record = await setup.Scoring.GetAsync($"{LiveScoringSetup.DecisionsPath}/APP-0001234");
        Assert.Equal(HttpStatusCode.OK, record.StatusCode);
    }
}
