using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Audit;

public sealed class AuditTrailTests
{
    [Fact]
    public async Task Verify_AfterSeveralChanges_ReportsTheWholeChainUnbroken()
    {
        await using var app = new LedgerlineApp();
        using var risk = await SeedAsync(app);

        var result = await risk.GetFromJsonAsync<JsonElement>("/audit/verify");

        Assert.True(result.GetProperty("verified").GetBoolean(), result.ToString());
        Assert.Equal(app.CountRows("AuditEntries"), result.GetProperty("entries").GetInt64());
        Assert.Matches("^[0-9a-f]{64}$", result.GetProperty("lastHash").GetString());
    }

    [Fact]
    public async Task Verify_RowEditedInTheDatabase_FailsAtThatEntry()
    {
        await using var app = new LedgerlineApp();
        using var risk = await SeedAsync(app);

        Assert.Equal(1, app.Execute("UPDATE \"AuditEntries\" SET \"Actor\" = 'someone-else' WHERE \"Sequence\" = 3"));
        var result = await risk.GetFromJsonAsync<JsonElement>("/audit/verify");

        Assert.False(result.GetProperty("verified").GetBoolean());
        Assert.Equal(3, result.GetProperty("brokenAt").GetInt64());
        Assert.Equal(2, result.GetProperty("entries").GetInt64());
        Assert.Contains("does not match its hash", result.GetProperty("reason").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Verify_RowEditedWithItsHashRecomputed_FailsAtTheNextEntry()
    {
        await using var app = new LedgerlineApp();
        using var risk = await SeedAsync(app);
        var page = await risk.GetFromJsonAsync<JsonElement>("/audit?limit=3");
        var third = page.GetProperty("entries")[2];
        var forged = new AuditEntry
        {
            Sequence = 3,
            At = third.GetProperty("at").GetDateTimeOffset().UtcDateTime,
            Actor = "someone-else",
            Action = third.GetProperty("action").GetString()!,
            Subject = third.GetProperty("subject").GetString()!,
            ContentHash = third.GetProperty("contentHash").GetString()!,
            PreviousHash = third.GetProperty("previousHash").GetString()!,
        };

        app.Execute($"UPDATE \"AuditEntries\" SET \"Actor\" = 'someone-else', \"EntryHash\" = '{AuditChain.HashEntry(forged)}' WHERE \"Sequence\" = 3");
        var result = await risk.GetFromJsonAsync<JsonElement>("/audit/verify");

        Assert.False(result.GetProperty("verified").GetBoolean());
        Assert.Equal(4, result.GetProperty("brokenAt").GetInt64());
        Assert.Contains("does not link to entry 3", result.GetProperty("reason").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Verify_RowDeleted_FailsWhereTheChainJumps()
    {
        await using var app = new LedgerlineApp();
        using var risk = await SeedAsync(app);

        app.Execute("DELETE FROM \"AuditEntries\" WHERE \"Sequence\" = 2");
        var result = await risk.GetFromJsonAsync<JsonElement>("/audit/verify");

        Assert.False(result.GetProperty("verified").GetBoolean());
        Assert.Equal(3, result.GetProperty("brokenAt").GetInt64());
        Assert.Contains("entry 2 is missing", result.GetProperty("reason").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Append_ManyConcurrentChanges_KeepsOneUnbrokenChain()
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();

        var responses = await Task.WhenAll(Enumerable.Range(0, 24).Select(i =>
            admin.PostAsJsonAsync("/access/keys", new { name = $"origination-{i}", roles = new List<string> { "scoring" } })));

        Assert.All(responses, r => Assert.Equal(HttpStatusCode.Created, r.StatusCode));
        var result = await admin.GetFromJsonAsync<JsonElement>("/audit/verify");
        Assert.True(result.GetProperty("verified").GetBoolean(), result.ToString());
        Assert.Equal(25, result.GetProperty("entries").GetInt64());
    }

    [Fact]
    public async Task Entry_HashOfCanonicalForm_IsReproducibleFromItsFields()
    {
        await using var app = new LedgerlineApp();
        using var risk = await SeedAsync(app);
        var entry = (await risk.GetFromJsonAsync<JsonElement>("/audit?limit=1")).GetProperty("entries")[0];

        // The documented canonical form, rebuilt by hand: a version line, then length:field lines.
        string[] fields =
        [
            "1",
            entry.GetProperty("at").GetDateTimeOffset().UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss.ffffff'Z'", System.Globalization.CultureInfo.InvariantCulture),
            entry.GetProperty("actor").GetString()!,
            entry.GetProperty("action").GetString()!,
            entry.GetProperty("subject").GetString()!,
            entry.GetProperty("contentHash").GetString()!,
            new string('0', 64),
        ];
        var text = "ledgerline-audit-v1\n" + string.Concat(fields.Select(f => $"{System.Text.Encoding.UTF8.GetByteCount(f)}:{f}\n"));
        var expected = Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.UTF8.GetBytes(text)));

        Assert.Equal("configuration", entry.GetProperty("actor").GetString());
        Assert.Equal(expected, entry.GetProperty("entryHash").GetString());
    }

    [Fact]
    public async Task List_WithLimit_PagesThroughEveryEntryOnce()
    {
        await using var app = new LedgerlineApp();
        using var risk = await SeedAsync(app);
        var seen = new List<long>();
        long? after = null;

        do
        {
            var page = await risk.GetFromJsonAsync<JsonElement>($"/audit?limit=2{(after is { } a ? $"&after={a}" : "")}");
            seen.AddRange(page.GetProperty("entries").EnumerateArray().Select(e => e.GetProperty("id").GetInt64()));
            after = page.TryGetProperty("next", out var next) ? next.GetInt64() : null;
        }
        while (after is not null);

        Assert.Equal(Enumerable.Range(1, (int)app.CountRows("AuditEntries")).Select(i => (long)i), seen);
    }

    [Fact]
    public async Task List_Filters_SelectByActionSubjectActorAndTime()
    {
        await using var app = new LedgerlineApp();
        using var risk = await SeedAsync(app);

        var created = await risk.GetFromJsonAsync<JsonElement>("/audit?action=key.created");
        var family = await risk.GetFromJsonAsync<JsonElement>($"/audit?subject={Scenario.Key}");
        var configuration = await risk.GetFromJsonAsync<JsonElement>("/audit?actor=configuration");
        var future = await risk.GetFromJsonAsync<JsonElement>($"/audit?from={Uri.EscapeDataString(DateTimeOffset.UtcNow.AddDays(1).ToString("O"))}");
        var past = await risk.GetFromJsonAsync<JsonElement>($"/audit?to={Uri.EscapeDataString(DateTimeOffset.UtcNow.AddDays(1).ToString("O"))}");

        Assert.Equal(3, created.GetProperty("entries").GetArrayLength());
        Assert.Equal(["scorecard.created", "version.registered"], family.GetProperty("entries").EnumerateArray().Select(e => e.GetProperty("action").GetString()));
        Assert.Single(configuration.GetProperty("entries").EnumerateArray());
        Assert.Equal(0, future.GetProperty("entries").GetArrayLength());
        Assert.Equal(app.CountRows("AuditEntries"), past.GetProperty("entries").GetArrayLength());
    }

    [Theory]
    [InlineData("limit=0", "limit")]
    [InlineData("limit=1001", "limit")]
    [InlineData("from=2026-02-01T00:00:00Z&to=2026-01-01T00:00:00Z", "from")]
    public async Task List_BadQuery_Answers400NamingTheParameter(string query, string parameter)
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();

        var response = await admin.GetAsync($"/audit?{query}");

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, parameter);
    }

    [Fact]
    public async Task RevokeKey_Twice_RecordsOneEntry()
    {
        await using var app = new LedgerlineApp();
        var (id, _) = await app.CreateKeyAsync(new { name = "origination-eu", roles = new List<string> { "scoring" } });
        using var admin = app.AdminClient();

        await admin.DeleteAsync($"/access/keys/{id}");
        await admin.DeleteAsync($"/access/keys/{id}");

        var revoked = await admin.GetFromJsonAsync<JsonElement>("/audit?action=key.revoked");
        Assert.Equal($"keys/{id}", Assert.Single(revoked.GetProperty("entries").EnumerateArray()).GetProperty("subject").GetString());
    }

    /// <summary>Bootstrap key (1), analyst key (2), risk key (3), family (4), version (5); returns the risk client.</summary>
    private static async Task<HttpClient> SeedAsync(LedgerlineApp app)
    {
        using var analyst = await app.ClientWithRolesAsync("analyst");
        var risk = await app.ClientWithRolesAsync("risk");
        await Scenario.CreateFamilyAsync(analyst);
        await Scenario.RegisterAsync(analyst, Scenario.Version());
        return risk;
    }
}
