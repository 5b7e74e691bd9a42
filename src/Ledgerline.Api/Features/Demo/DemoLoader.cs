using System.Security.Cryptography;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Microsoft.AspNetCore.Hosting.Server;
using Microsoft.AspNetCore.Hosting.Server.Features;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace Ledgerline.Api.Features.Demo;

/// <summary>
/// Once the server listens, fills an empty database with the demo scenario by calling the
/// service's own HTTP endpoints, so every row passes the same validation, scoring, assignment,
/// decision logging and outcome classification as real traffic. Prints where to look and the key.
/// </summary>
public sealed partial class DemoLoader(
    IServiceScopeFactory scopes,
    IServer server,
    IHostApplicationLifetime lifetime,
    IHttpClientFactory clients,
    IOptions<DemoOptions> options,
    DemoState state,
    TimeProvider clock,
    ILogger<DemoLoader> logger) : BackgroundService
{
    public const string ClientName = "demo";

    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        try
        {
            await WhenStartedAsync(stoppingToken);
            await LoadAsync(stoppingToken);
            state.Ready();
        }
        catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
        {
            // Shutting down mid-load; the next start finds a partial scenario and says so.
        }
        catch (Exception e) when (e is HttpRequestException or InvalidOperationException or DbUpdateException)
        {
            state.Failed(e.Message);
            LogFailed(e);
        }
    }

    private async Task LoadAsync(CancellationToken ct)
    {
        var settings = options.Value;
        var baseAddress = LoopbackAddress();
        await using var scope = scopes.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<LedgerlineDbContext>();
        var hasDemo = await db.Scorecards.AnyAsync(s => s.Key == DemoScenario.ScorecardKey, ct);
        if (!hasDemo && await db.Scorecards.AnyAsync(ct))
        {
            LogNotEmpty();
            Console.WriteLine($"Demo not loaded: the database already holds other scorecards. Start with an empty database (e.g. delete ledgerline-demo.db) to load it.");
            return;
        }

        var reader = await AddKeyAsync(db, "demo reader (analyst, risk)", $"{Roles.Analyst},{Roles.Risk}", settings.Key, ct);
        if (!hasDemo)
        {
            var keys = new DemoKeys(
                await AddKeyAsync(db, "demo analyst", Roles.Analyst, null, ct),
                await AddKeyAsync(db, "demo risk manager", Roles.Risk, null, ct),
                await AddKeyAsync(db, "demo origination system", Roles.Scoring, null, ct),
                await AddKeyAsync(db, "demo servicing system", Roles.Outcomes, null, ct));
            using var http = clients.CreateClient(ClientName);
            http.BaseAddress = baseAddress;
            var started = clock.GetTimestamp();
            var summary = await new DemoScenario(http, keys, settings, clock).RunAsync(ct);
            LogLoaded(summary.Applications, summary.Outcomes, clock.GetElapsedTime(started).TotalSeconds);
        }

        Console.WriteLine($"""

            ──────────────── Ledgerline demo ────────────────
            Invented lender: {DemoScenario.Lender}
            Scorecard:       {DemoScenario.ScorecardKey} (champion v1, challenger v2 on 20%, shadow v3)
            Overview page:   {new Uri(baseAddress, $"/scorecards/{DemoScenario.ScorecardKey}/reports/overview")}
            Key (analyst, risk; shown this once): {reader}
            Send it as:      Authorization: Bearer <key>
            Try:             curl -H "Authorization: Bearer {reader}" -H "Accept: text/html" {new Uri(baseAddress, $"/scorecards/{DemoScenario.ScorecardKey}/reports/overview")} -o overview.html
            ─────────────────────────────────────────────────

            """);
    }

    private async Task<string> AddKeyAsync(LedgerlineDbContext db, string name, string roles, string? secret, CancellationToken ct)
    {
        // The same shape as POST /access/keys makes: 256 random bits, stored only as a hash.
        secret ??= "ll_" + Convert.ToBase64String(RandomNumberGenerator.GetBytes(32)).TrimEnd('=').Replace('+', '-').Replace('/', '_');
        var hash = ApiKeyAuthentication.HashSecret(secret);
        if (await db.ApiKeys.AnyAsync(k => k.SecretHash == hash, ct))
        {
            return secret;
        }

        var key = new ApiKey
        {
            Id = Guid.CreateVersion7(),
            Name = name,
            SecretHash = hash,
            Roles = roles,
            CreatedAt = clock.GetUtcNow(),
            CreatedBy = "demo",
        };
        db.ApiKeys.Add(key);
        db.Record(key.CreatedBy, "key.created", $"keys/{key.Id}", new { key.Name, key.Roles }, key.CreatedAt);
        await db.SaveChangesAsync(ct);
        return secret;
    }

    private Task WhenStartedAsync(CancellationToken ct)
    {
        var started = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        lifetime.ApplicationStarted.Register(() => started.TrySetResult());
        return started.Task.WaitAsync(ct);
    }

    /// <summary>The server's own HTTP address, with wildcard hosts replaced by the loopback address.</summary>
    private Uri LoopbackAddress()
    {
        var addresses = server.Features.Get<IServerAddressesFeature>()?.Addresses ?? [];
        var address = addresses.FirstOrDefault(a => a.StartsWith("http://", StringComparison.OrdinalIgnoreCase)) ?? addresses.FirstOrDefault()
            ?? throw new InvalidOperationException("The server reports no listening address to load the demo through.");
        var uri = new UriBuilder(address.Replace("://+", "://127.0.0.1", StringComparison.Ordinal).Replace("://*", "://127.0.0.1", StringComparison.Ordinal));
        if (uri.Host is "0.0.0.0" or "[::]" or "::" or "localhost")
        {
            uri.Host = "127.0.0.1";
        }

        return uri.Uri;
    }

    [LoggerMessage(Level = LogLevel.Information, Message = "Demo scenario loaded: {Applications} applications, {Outcomes} outcome readings in {Seconds:F1} s")]
    private partial void LogLoaded(int applications, int outcomes, double seconds);

    [LoggerMessage(Level = LogLevel.Warning, Message = "Demo not loaded: the database already holds other scorecards")]
    private partial void LogNotEmpty();

    [LoggerMessage(Level = LogLevel.Error, Message = "The demo scenario failed to load")]
    private partial void LogFailed(Exception exception);
}

/// <summary>The keys the demo acts with: a different person registers and approves, as the four-eyes rule asks.</summary>
public sealed record DemoKeys(string Analyst, string Risk, string Scoring, string Outcomes);
