using System.Net;
using System.Text.Json.Nodes;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Decisions;

public sealed class IdempotencyTests
{
    [Fact]
    public async Task Decide_SameApplicationSameBodyReordered_Answers200WithOriginalAndNoSecondRecord()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var first = await setup.DecideAsync(LiveScoringSetup.Application("APP-1"));
        var reordered = JsonNode.Parse("""
            { "characteristics": { "residentialStatus": "tenant", "monthsAtAddress": 30.0 },
              "applicationDate": "2026-01-15", "applicationId": "APP-1" }
            """)!;

        var replay = await setup.DecideAsync(reordered);

        Assert.Equal(HttpStatusCode.Created, first.StatusCode);
        Assert.Equal(HttpStatusCode.OK, replay.StatusCode);
        Assert.Equal(await first.Content.ReadAsStringAsync(), await replay.Content.ReadAsStringAsync());
        Assert.Equal(1, app.CountRows("Decisions"));
        Assert.Equal(3, app.CountRows("DecisionScores"));
    }

    [Fact]
    public async Task Decide_StoredRequestHash_IsSha256OfTheCanonicalFormAndStaysTheSame()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var body = JsonNode.Parse("""
            { "characteristics": { "residentialStatus": "tenant", "monthsAtAddress": 30.0 },
              "applicationDate": "2026-01-15", "applicationId": "APP-H1" }
            """)!;

        (await setup.DecideAsync(body)).EnsureSuccessStatusCode();

        // Replays of decisions logged by earlier releases compare against stored hashes, so the
        // canonical form must never drift. Expected value: Python 3.11 hashlib.sha256 of
        // {"applicationId":"APP-H1","assignmentKey":null,"applicationDate":"2026-01-15",
        // "characteristics":{"monthsAtAddress":30,"residentialStatus":"tenant"}} (UTF-8, no spaces).
        using var connection = app.OpenDatabase();
        using var command = connection.CreateCommand();
        command.CommandText = "SELECT \"RequestHash\" FROM \"Decisions\"";
        Assert.Equal("e9a310941906dc1b424ddad1fa0bdc1035f16741f56965e7185d6ec82b3f2e93", command.ExecuteScalar());
    }

    [Fact]
    public async Task Decide_SameIdempotencyKeyDifferentBody_Answers409SayingWhy()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        (await setup.DecideAsync(LiveScoringSetup.Application("APP-1"), "key-5d1f0c9e")).EnsureSuccessStatusCode();

        var response = await setup.DecideAsync(LiveScoringSetup.Application("APP-2"), "key-5d1f0c9e");

        await response.AssertProblemAsync(HttpStatusCode.Conflict, "key-5d1f0c9e", "different body", "APP-1");
        Assert.Equal(1, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task Decide_SameApplicationDifferentBody_Answers409SayingWhy()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        (await setup.DecideAsync(LiveScoringSetup.Application("APP-1"))).EnsureSuccessStatusCode();

        var response = await setup.DecideAsync(LiveScoringSetup.Application("APP-1", monthsAtAddress: 5));

        await response.AssertProblemAsync(HttpStatusCode.Conflict, "APP-1", "different body", "never replaced");
        Assert.Equal(1, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task Decide_SameIdempotencyKeySameBody_Answers200()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var first = await LiveScoringSetup.BodyAsync(await setup.DecideAsync(LiveScoringSetup.Application("APP-1"), "k-1"));

        var replay = await setup.DecideAsync(LiveScoringSetup.Application("APP-1"), "k-1");

        Assert.Equal(HttpStatusCode.OK, replay.StatusCode);
        Assert.Equal(first.GetProperty("decisionId").GetString(), (await LiveScoringSetup.BodyAsync(replay)).GetProperty("decisionId").GetString());
        Assert.Equal(1, app.CountRows("Decisions"));
    }

    [Fact]
    public async Task Decide_ConcurrentDuplicates_OneRecordOneCreatedRestReplayTheSameDecision()
    {
        await using var app = new LedgerlineApp();
        var setup = await LiveScoringSetup.WithPlanAsync(app);

        var responses = await Task.WhenAll(Enumerable.Range(0, 24).Select(_ => setup.DecideAsync(LiveScoringSetup.Application("APP-RACE"))));

        Assert.Single(responses, r => r.StatusCode == HttpStatusCode.Created);
        Assert.Equal(23, responses.Count(r => r.StatusCode == HttpStatusCode.OK));
        var ids = await Task.WhenAll(responses.Select(async r => (await LiveScoringSetup.BodyAsync(r)).GetProperty("decisionId").GetString()));
        Assert.Single(ids.Distinct());
        Assert.Equal(1, app.CountRows("Decisions"));
        Assert.Equal(3, app.CountRows("DecisionScores"));
    }
}
