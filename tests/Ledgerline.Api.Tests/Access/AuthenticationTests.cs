using System.Net;
using System.Net.Http.Headers;
using Ledgerline.Api.Tests.Infrastructure;

namespace Ledgerline.Api.Tests.Access;

/// <summary>OWASP API Security Top 10 (2023), API2: broken authentication.</summary>
public sealed class AuthenticationTests
{
    [Fact]
    public async Task Request_WithoutKey_Answers401WithBearerChallenge()
    {
        await using var app = new LedgerlineApp();
        using var client = app.CreateClient();

        var response = await client.GetAsync("/scorecards");

        await response.AssertProblemAsync(HttpStatusCode.Unauthorized, "Authorization: Bearer <key>");
        Assert.Equal("Bearer", response.Headers.WwwAuthenticate.Single().Scheme);
    }

    [Theory]
    [InlineData("Basic dXNlcjpwYXNz")]
    [InlineData("Bearer")]
    [InlineData("Bearer    ")]
    [InlineData("Token abc")]
    public async Task Request_MalformedAuthorization_Answers401(string header)
    {
        await using var app = new LedgerlineApp();
        using var client = app.CreateClient();
        using var request = new HttpRequestMessage(HttpMethod.Get, "/scorecards");
        request.Headers.TryAddWithoutValidation("Authorization", header);

        var response = await client.SendAsync(request);

        await response.AssertProblemAsync(HttpStatusCode.Unauthorized, "Bearer <key>");
    }

    [Fact]
    public async Task Request_UnknownKey_Answers401()
    {
        await using var app = new LedgerlineApp();
        using var client = app.ClientWithKey("ll_" + new string('x', 43));

        var response = await client.GetAsync("/scorecards");

        await response.AssertProblemAsync(HttpStatusCode.Unauthorized, "not known");
    }

    [Fact]
    public async Task Request_RevokedKey_Answers401AtOnce()
    {
        await using var app = new LedgerlineApp();
        var (id, key) = await app.CreateKeyAsync(new { name = "origination-eu", roles = new List<string> { "analyst" } });
        using var client = app.ClientWithKey(key);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/scorecards")).StatusCode);
        using var admin = app.AdminClient();

        Assert.Equal(HttpStatusCode.NoContent, (await admin.DeleteAsync($"/access/keys/{id}")).StatusCode);
        var response = await client.GetAsync("/scorecards");

        // Within the authentication cache's lifetime: revocation must evict the cached key.
        await response.AssertProblemAsync(HttpStatusCode.Unauthorized, "revoked");
    }

    [Fact]
    public async Task Request_ExpiredKey_Answers401()
    {
        var clock = new MovableClock();
        await using var app = new LedgerlineApp(clock: clock);
        var (_, key) = await app.CreateKeyAsync(new { name = "temporary analyst", roles = new List<string> { "analyst" }, expiresAt = clock.GetUtcNow().AddHours(1) });
        using var client = app.ClientWithKey(key);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/scorecards")).StatusCode);

        clock.Offset = TimeSpan.FromHours(2);
        var response = await client.GetAsync("/scorecards");

        await response.AssertProblemAsync(HttpStatusCode.Unauthorized, "expired");
    }

    [Fact]
    public async Task CreateKey_ExpiryInThePast_Answers400AndStoresNothing()
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();
        var before = app.CountRows("ApiKeys");

        var response = await admin.PostAsync("/access/keys", Scenario.Json("""{ "name": "late", "roles": ["analyst"], "expiresAt": "2001-01-01T00:00:00Z" }"""));

        await response.AssertProblemAsync(HttpStatusCode.BadRequest, "expiresAt", "future");
        Assert.Equal(before, app.CountRows("ApiKeys"));
    }

    [Fact]
    public async Task CreateKey_Secret_Has256RandomBitsAndIsStoredOnlyAsHash()
    {
        await using var app = new LedgerlineApp();
        var (_, key) = await app.CreateKeyAsync(new { name = "origination-eu", roles = new List<string> { "scoring" } });

        // "ll_" + unpadded base64url of 32 random bytes.
        Assert.Matches("^ll_[A-Za-z0-9_-]{43}$", key);
        using var connection = app.OpenDatabase();
        using var command = connection.CreateCommand();
        command.CommandText = "SELECT * FROM \"ApiKeys\"";
        using var reader = command.ExecuteReader();
        var hashes = new List<string>();
        while (reader.Read())
        {
            for (var i = 0; i < reader.FieldCount; i++)
            {
                Assert.DoesNotContain(key[3..], reader.IsDBNull(i) ? string.Empty : reader.GetValue(i).ToString(), StringComparison.Ordinal);
            }

            hashes.Add(reader.GetString(reader.GetOrdinal("SecretHash")));
        }

        // SHA-256 of the secret as UTF-8, lower-case hex (System.Security.Cryptography, .NET 10).
        var expected = Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.UTF8.GetBytes(key)));
        Assert.Contains(expected, hashes);
    }

    [Fact]
    public async Task ListKeys_NeverShowsSecrets()
    {
        await using var app = new LedgerlineApp();
        var (_, key) = await app.CreateKeyAsync(new { name = "origination-eu", roles = new List<string> { "scoring" } });
        using var admin = app.AdminClient();

        var body = await admin.GetStringAsync("/access/keys");

        Assert.Contains("origination-eu", body, StringComparison.Ordinal);
        Assert.DoesNotContain(key, body, StringComparison.Ordinal);
        Assert.DoesNotContain(app.AdminKey, body, StringComparison.Ordinal);
    }

    [Fact]
    public async Task BootstrapKey_WithKeysPresent_IsNotAddedAgain()
    {
        await using var app = new LedgerlineApp();
        using var admin = app.AdminClient();
        Assert.Equal(HttpStatusCode.OK, (await admin.GetAsync("/access/keys")).StatusCode);

        // A second start on the same database with another bootstrap secret adds no key.
        var secondSecret = "another-secret-" + Guid.NewGuid();
        await using var restarted = app.WithWebHostBuilder(b => b.UseSetting("Access:BootstrapAdminKey", secondSecret));
        using var other = restarted.CreateClient();
        other.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", secondSecret);

        Assert.Equal(HttpStatusCode.Unauthorized, (await other.GetAsync("/access/keys")).StatusCode);
        Assert.Equal(1, app.CountRows("ApiKeys"));
    }
}
