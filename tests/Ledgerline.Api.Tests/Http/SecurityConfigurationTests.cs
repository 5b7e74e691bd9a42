using System.Net;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Http;

/// <summary>OWASP API Security Top 10 (2023), API8: security misconfiguration.</summary>
public sealed class SecurityConfigurationTests
{
    [Theory]
    [InlineData("Production", HttpStatusCode.NotFound)]
    [InlineData("Testing", HttpStatusCode.NotFound)]
    [InlineData("Development", HttpStatusCode.OK)]
    public async Task SwaggerUi_ByEnvironment_IsServedOnlyInDevelopment(string environment, HttpStatusCode expected)
    {
        await using var app = new LedgerlineApp(environment: environment);
        // An admin key, since without one any unmapped address answers 401 (default deny).
        using var client = app.AdminClient();

        var response = await client.GetAsync("/swagger/index.html");

        Assert.Equal(expected, response.StatusCode);
    }

    [Fact]
    public async Task OpenApiDocument_WithoutKey_IsServed()
    {
        await using var app = new LedgerlineApp(environment: "Production");
        using var client = app.CreateClient();

        var response = await client.GetAsync("/openapi/v1.json");

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
    }

    [Theory]
    [InlineData("Production")]
    [InlineData("Development")]
    public async Task UnexpectedError_CorruptedStoredRow_Answers500WithoutStackTraceOrSql(string environment)
    {
        await using var app = new LedgerlineApp(environment: environment);
        using var analyst = await app.ClientWithRolesAsync("analyst");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        app.Execute("UPDATE \"Versions\" SET \"Content\" = '{ not json'");

        var response = await analyst.GetAsync($"/scorecards/{Scenario.Key}/versions/1");

        var problem = await response.AssertProblemAsync(HttpStatusCode.InternalServerError);
        var body = problem.ToString();
        Assert.True(problem.TryGetProperty("traceId", out _), body);
        foreach (var leak in new[] { "Exception", " at ", "Ledgerline.", "SELECT", "Versions", ".cs:line", "not json" })
        {
            Assert.DoesNotContain(leak, body, StringComparison.Ordinal);
        }
    }

    [Fact]
    public async Task DatabaseError_WriteRefusedByTheDatabase_Answers500WithoutSql()
    {
        await using var app = new LedgerlineApp(environment: "Production");
        using var admin = app.AdminClient();
        app.Execute(TestDatabase.IsPostgres
            ? """
              CREATE FUNCTION refuse_keys() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RAISE EXCEPTION 'refused by trigger'; END $$;
              CREATE TRIGGER refuse_keys BEFORE INSERT ON "ApiKeys" FOR EACH ROW EXECUTE FUNCTION refuse_keys();
              """
            : "CREATE TRIGGER refuse_keys BEFORE INSERT ON ApiKeys BEGIN SELECT RAISE(ABORT, 'refused by trigger'); END;");

        var response = await admin.PostAsync("/access/keys", Scenario.Json("""{ "name": "origination-eu", "roles": ["scoring"] }"""));

        var body = (await response.AssertProblemAsync(HttpStatusCode.InternalServerError)).ToString();
        foreach (var leak in new[] { "SQLite", "Npgsql", "refused by trigger", "INSERT", "ApiKeys", "Exception" })
        {
            Assert.DoesNotContain(leak, body, StringComparison.Ordinal);
        }

        Assert.Equal(1, app.CountRows("AuditEntries"));
    }
}
