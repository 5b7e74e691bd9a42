using System.Net;
using System.Text;
using System.Text.Json;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Outcomes;

public sealed class RecordOutcomesTests
{
    [Fact]
    public async Task RecordOutcomes_ContractExampleWithOneUnknownId_StoresThreeAndNamesTheFourth()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-0001234", "APP-0001235", "APP-0001237");

        var response = await setup.PostJsonAsync("""
            { "outcomes": [
                { "applicationId": "APP-0001234", "observedAt": "2026-03-16", "worstDaysPastDue": 95 },
                { "applicationId": "APP-0001235", "observedAt": "2026-04-01", "worstDaysPastDue": 0 },
                { "applicationId": "APP-0001236", "observedAt": "2025-09-01", "chargedOff": true },
                { "applicationId": "APP-0001237", "observedAt": "2026-04-01", "status": "good" } ] }
            """);

        var body = await OutcomeSetup.OkBodyAsync(response);
        Assert.Equal(3, body.GetProperty("accepted").GetInt32());
        var rejected = Assert.Single(body.GetProperty("rejected").EnumerateArray());
        Assert.Equal(2, rejected.GetProperty("index").GetInt32());
        Assert.Equal("APP-0001236", rejected.GetProperty("applicationId").GetString());
        Assert.Contains("No decision for application 'APP-0001236'", rejected.GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Equal(3, app.CountRows("Outcomes"));
        var bad = await setup.OutcomeOfAsync("APP-0001234");
        Assert.Equal("bad", bad.GetProperty("status").GetString());
        Assert.True(bad.GetProperty("matured").GetBoolean());
        Assert.Equal("good", (await setup.OutcomeOfAsync("APP-0001235")).GetProperty("status").GetString());
    }

    [Fact]
    public async Task RecordOutcomes_Csv_StoresRowsLikeJson()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1", "APP-2", "APP-3");

        var response = await setup.PostCsvAsync("""
            applicationId,observedAt,worstDaysPastDue,chargedOff,status
            APP-1,2026-04-01,95,,
            "APP-2",2026-04-01,,,good
            APP-3,2025-09-01,,true,

            """);

        var body = await OutcomeSetup.OkBodyAsync(response);
        Assert.Equal(3, body.GetProperty("accepted").GetInt32());
        Assert.Empty(body.GetProperty("rejected").EnumerateArray());
        Assert.Equal("bad", (await setup.OutcomeOfAsync("APP-3")).GetProperty("status").GetString());
        Assert.Equal("good", (await setup.OutcomeOfAsync("APP-2")).GetProperty("status").GetString());
    }

    public static TheoryData<string, string, string> BadRows => new()
    {
        { "an unknown application id", """{ "applicationId": "APP-9", "observedAt": "2026-04-01", "worstDaysPastDue": 0 }""", "No decision for application 'APP-9'" },
        { "observedAt before the application date", """{ "applicationId": "APP-1", "observedAt": "2025-03-14", "worstDaysPastDue": 0 }""", "before the application date 2025-03-15" },
        { "observedAt in the future", """{ "applicationId": "APP-1", "observedAt": "2099-01-01", "worstDaysPastDue": 0 }""", "in the future" },
        { "negative days past due", """{ "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": -5 }""", "0 or more whole days" },
        { "non-integer days past due", """{ "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 95.5 }""", "worstDaysPastDue 95.5 is not a whole number" },
        { "days past due in quotes", """{ "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": "95" }""", "not in quotes" },
        { "none of the outcome fields", """{ "applicationId": "APP-1", "observedAt": "2026-04-01" }""", "gives no outcome" },
        { "status good with 120 days past due", """{ "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 120, "status": "good" }""", "status 'good' contradicts worstDaysPastDue 120" },
        { "an unknown status word", """{ "applicationId": "APP-1", "observedAt": "2026-04-01", "status": "defaulted" }""", "status 'defaulted' is not one of good, bad, indeterminate" },
        { "a date in another format", """{ "applicationId": "APP-1", "observedAt": "01/04/2026", "worstDaysPastDue": 0 }""", "observedAt '01/04/2026' is not a date" },
        { "an unknown field", """{ "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 0, "balance": 10 }""", "'balance' is not a field of an outcome" },
        { "no application id", """{ "observedAt": "2026-04-01", "worstDaysPastDue": 0 }""", "applicationId is missing" },
    };

    [Theory]
    [MemberData(nameof(BadRows))]
    public async Task RecordOutcomes_BadRow_IsNamedAndNothingOfItStored(string rule, string row, string mention)
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1", "APP-2");

        var response = await setup.PostJsonAsync($$"""{ "outcomes": [ { "applicationId": "APP-2", "observedAt": "2026-04-01", "worstDaysPastDue": 0 }, {{row}} ] }""");

        var body = await OutcomeSetup.OkBodyAsync(response);
        Assert.True(body.GetProperty("accepted").GetInt32() == 1, rule);
        var rejected = Assert.Single(body.GetProperty("rejected").EnumerateArray());
        Assert.Equal(1, rejected.GetProperty("index").GetInt32());
        Assert.Contains(mention, rejected.GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Equal(1, app.CountRows("Outcomes"));
        Assert.Equal(JsonValueKind.Undefined, (await setup.OutcomeOfAsync("APP-1")).ValueKind);
    }

    [Fact]
    public async Task RecordOutcomes_AtomicWithOneBadRow_StoresNothingAndListsEveryBadRow()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1", "APP-2");

        var response = await setup.PostJsonAsync("""
            { "outcomes": [
                { "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 0 },
                { "applicationId": "APP-2", "observedAt": "2026-04-01", "worstDaysPastDue": -1 },
                { "applicationId": "APP-3", "observedAt": "2026-04-01", "worstDaysPastDue": 0 } ] }
            """, "?atomic=true");

        var problem = await response.AssertProblemAsync(HttpStatusCode.BadRequest, "No outcome was stored", "atomic=true", "row 1");
        var rejected = problem.GetProperty("rejected").EnumerateArray().Select(r => r.GetProperty("index").GetInt32()).ToList();
        Assert.Equal([1, 2], rejected);
        Assert.Equal(0, app.CountRows("Outcomes"));
        Assert.Equal(JsonValueKind.Undefined, (await setup.OutcomeOfAsync("APP-1")).ValueKind);
    }

    [Fact]
    public async Task RecordOutcomes_AtomicAllGood_StoresEveryRow()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1", "APP-2");

        var response = await setup.PostJsonAsync("""
            { "outcomes": [ { "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 0 },
                            { "applicationId": "APP-2", "observedAt": "2026-04-01", "worstDaysPastDue": 40 } ] }
            """, "?atomic=true");

        Assert.Equal(2, (await OutcomeSetup.OkBodyAsync(response)).GetProperty("accepted").GetInt32());
        Assert.Equal(2, app.CountRows("Outcomes"));
    }

    [Fact]
    public async Task RecordOutcomes_JsonBrokenAfterGoodRows_StoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");
        var rows = string.Join(",", Enumerable.Range(0, 3000).Select(_ => """{ "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 0 }"""));

        var response = await setup.PostJsonAsync($$"""{ "outcomes": [ {{rows}}, { "applicationId": "APP-1", "observedAt": } ] }""");

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "not valid JSON", "line 1");
        Assert.Equal(0, app.CountRows("Outcomes"));
    }

    [Theory]
    [InlineData("a header with a missing observedAt column", "applicationId,worstDaysPastDue\nAPP-1,0\n", "no 'observedAt' column")]
    [InlineData("a header separated by semicolons", "applicationId;observedAt;worstDaysPastDue\nAPP-1;2026-04-01;0\n", "separated by ';'")]
    [InlineData("a header without an outcome column", "applicationId,observedAt\nAPP-1,2026-04-01\n", "none of the outcome columns")]
    [InlineData("an unknown column", "applicationId,observedAt,dpd\nAPP-1,2026-04-01,0\n", "Column 'dpd' is not a field")]
    [InlineData("an empty body", "", "body is empty")]
    public async Task RecordOutcomes_CsvWithBadHeader_Answers400AndStoresNothing(string rule, string csv, string mention)
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");

        var response = await setup.PostCsvAsync(csv);

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, mention);
        Assert.True(app.CountRows("Outcomes") == 0, rule);
    }

    [Theory]
    [InlineData("a bad date", "APP-1,2026-13-01,0", "observedAt '2026-13-01' is not a date")]
    [InlineData("a row separated by semicolons", "APP-1;2026-04-01;0", "The row has 1 field; the header names 3 columns")]
    [InlineData("a non-integer days past due", "APP-1,2026-04-01,12.5", "worstDaysPastDue '12.5' is not a whole number")]
    public async Task RecordOutcomes_CsvBadRow_IsNamedAndOthersStored(string rule, string line, string mention)
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1", "APP-2");

        var response = await setup.PostCsvAsync($"applicationId,observedAt,worstDaysPastDue\nAPP-2,2026-04-01,0\n{line}\n");

        var body = await OutcomeSetup.OkBodyAsync(response);
        Assert.True(body.GetProperty("accepted").GetInt32() == 1, rule);
        var rejected = Assert.Single(body.GetProperty("rejected").EnumerateArray());
        Assert.Equal(1, rejected.GetProperty("index").GetInt32());
        Assert.Contains(mention, rejected.GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Equal(1, app.CountRows("Outcomes"));
    }

    [Fact]
    public async Task RecordOutcomes_BodyOverTheLimit_Answers413AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");
        var padding = new string(' ', 17 * 1024 * 1024);

        var response = await setup.PostJsonAsync($$"""{ "outcomes": [ { "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 0 } {{padding}} ] }""");

        await response.AssertProblemAsync(HttpStatusCode.RequestEntityTooLarge, "16,777,216 bytes");
        Assert.Equal(0, app.CountRows("Outcomes"));
    }

    [Fact]
    public async Task RecordOutcomes_MoreThan50000Rows_Answers400AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");
        var csv = new StringBuilder("applicationId,observedAt,worstDaysPastDue\n");
        for (var i = 0; i <= 50_000; i++)
        {
            csv.Append("APP-1,2026-04-01,0\n");
        }

        var response = await setup.PostCsvAsync(csv.ToString());

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "more than 50,000 rows");
        Assert.Equal(0, app.CountRows("Outcomes"));
    }

    [Fact]
    public async Task RecordOutcomes_PlainText_Answers415()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app);

        var response = await setup.Servicing.PostAsync(OutcomeSetup.OutcomesPath, new StringContent("APP-1 2026-04-01 0", Encoding.UTF8, "text/plain"));

        await response.AssertProblemAsync(HttpStatusCode.UnsupportedMediaType, "text/csv");
    }

    [Fact]
    public async Task RecordOutcomes_ScoringKey_IsForbidden()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");

        var response = await setup.Live.Scoring.PostAsync(OutcomeSetup.OutcomesPath,
            Scenario.Json("""{ "outcomes": [ { "applicationId": "APP-1", "observedAt": "2026-04-01", "worstDaysPastDue": 0 } ] }"""));

        Assert.Equal(HttpStatusCode.Forbidden, response.StatusCode);
        Assert.Equal(0, app.CountRows("Outcomes"));
    }

    [Fact]
    public async Task RecordOutcomes_Accepted_RecordsTheBatchInTheAuditTrail()
    {
        await using var app = new LedgerlineApp();
        var setup = await OutcomeSetup.WithDecisionsAsync(app, "APP-1");

        await OutcomeSetup.OkBodyAsync(await setup.PostRowsAsync(new { applicationId = "APP-1", observedAt = "2026-04-01", worstDaysPastDue = 0 }));

        using var db = app.OpenDatabase();
        using var command = db.CreateCommand();
        command.CommandText = "SELECT \"Subject\" FROM \"AuditEntries\" WHERE \"Action\" = 'outcomes.recorded'";
        Assert.Equal($"{Scenario.Key}/outcomes", command.ExecuteScalar());
    }
}
