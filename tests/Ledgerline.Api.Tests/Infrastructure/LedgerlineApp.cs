using System.Data.Common;
using System.Net.Http.Headers;
using System.Net.Http.Json;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.TestHost;
using Microsoft.Extensions.DependencyInjection;

namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>
/// The real app with its own fresh database, hosted in-process: every request goes through the
/// whole ASP.NET Core pipeline (routing, authentication, validation, EF Core, and SQLite or
/// PostgreSQL as <see cref="TestDatabase.Provider"/> says). One per test, so tests share nothing
/// and can run in any order.
/// </summary>
public sealed class LedgerlineApp : WebApplicationFactory<Program>
{
    private readonly TestDatabase _database = TestDatabase.Create();
    private readonly Dictionary<string, string?> _settings = [];
    private readonly string _environment;
    private readonly TimeProvider? _clock;
    private readonly Action<IServiceCollection>? _services;

    /// <param name="settings">Configuration to add, e.g. <c>Limits:PermitsPerSecond</c>.</param>
    /// <param name="environment">The hosting environment; <c>Testing</c> unless a test checks environment-specific behaviour.</param>
    /// <param name="clock">Replaces the system clock, for tests that move time.</param>
    /// <param name="services">Adds to the app's services, e.g. a logger provider that records what the app did.</param>
    public LedgerlineApp(
        IDictionary<string, string?>? settings = null, string environment = "Testing", TimeProvider? clock = null, Action<IServiceCollection>? services = null)
    {
        // Real Kestrel on a loopback port, so server limits (body size, timeouts) apply as in production.
        UseKestrel(0);
        _environment = environment;
        _clock = clock;
        _services = services;
        if (settings is not null)
        {
            foreach (var (k, v) in settings)
            {
                _settings[k] = v;
            }
        }
    }

    public string AdminKey { get; } = "test-admin-" + Guid.NewGuid().ToString("N");

    public string ConnectionString => _database.ConnectionString;

    /// <summary>
    /// Every test client sends <c>Expect: 100-continue</c>, so the server can refuse a body by its
    /// declared length (413) or refuse the request (401/403) before the body is sent, as real
    /// clients of bulk routes should; otherwise the refusal races the upload.
    /// </summary>
    protected override void ConfigureClient(HttpClient client)
    {
        base.ConfigureClient(client);
        client.DefaultRequestHeaders.ExpectContinue = true;
    }

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseEnvironment(_environment);
        if (_clock is not null)
        {
            builder.ConfigureTestServices(services => services.AddSingleton(_clock));
        }

        if (_services is not null)
        {
            builder.ConfigureTestServices(_services);
        }

        builder.UseSetting("Database:Provider", TestDatabase.Provider);
        builder.UseSetting("ConnectionStrings:Ledgerline", ConnectionString);
        builder.UseSetting("Access:BootstrapAdminKey", AdminKey);
        foreach (var (k, v) in _settings)
        {
            builder.UseSetting(k, v);
        }
    }

    /// <summary>A client authenticated with the bootstrap admin key.</summary>
    public HttpClient AdminClient()
    {
        var client = CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", AdminKey);
        return client;
    }

    /// <summary>A client holding a fresh key with the given roles, made through POST /access/keys.</summary>
    public async Task<HttpClient> ClientWithRolesAsync(params string[] roles)
    {
        using var admin = AdminClient();
        var response = await admin.PostAsJsonAsync("/access/keys", new { name = "test " + string.Join("+", roles), roles });
        response.EnsureSuccessStatusCode();
        var created = await response.Content.ReadFromJsonAsync<CreatedKey>();
        var client = CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", created!.Key);
        return client;
    }

    /// <summary>Creates a key through POST /access/keys with any body (roles, scorecards, expiry) and returns its id and secret.</summary>
    public async Task<(Guid Id, string Key)> CreateKeyAsync(object body)
    {
        using var admin = AdminClient();
        var response = await admin.PostAsJsonAsync("/access/keys", body);
        response.EnsureSuccessStatusCode();
        var created = await response.Content.ReadFromJsonAsync<CreatedKey>();
        return (created!.Id, created.Key);
    }

    /// <summary>A client sending the given secret as its bearer key.</summary>
    public HttpClient ClientWithKey(string key)
    {
        var client = CreateClient();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", key);
        return client;
    }

    /// <summary>Runs one SQL statement straight against the database (to tamper with rows, as an attacker with database access could).</summary>
    public int Execute(string sql)
    {
        using var connection = OpenDatabase();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        return command.ExecuteNonQuery();
    }

    /// <summary>Opens the test's database directly, for checks that nothing was stored.</summary>
    public DbConnection OpenDatabase() => _database.Open();

    /// <summary>Counts rows of a table straight from the database.</summary>
    public long CountRows(string table)
    {
        using var connection = OpenDatabase();
        using var command = connection.CreateCommand();
        command.CommandText = $"SELECT COUNT(*) FROM \"{table}\"";
        return Convert.ToInt64(command.ExecuteScalar()!, System.Globalization.CultureInfo.InvariantCulture);
    }

    public override async ValueTask DisposeAsync()
    {
        await base.DisposeAsync();
        await _database.DisposeAsync();
    }

    private sealed record CreatedKey(Guid Id, string Key);
}
