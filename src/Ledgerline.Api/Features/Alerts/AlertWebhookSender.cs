using System.Text;
using Ledgerline.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace Ledgerline.Api.Features.Alerts;

/// <summary>
/// Posts new alerts from the delivery outbox to <c>Alerts:WebhookUrl</c>, retrying failures with
/// exponential back-off. Runs apart from every request, so a slow or failing receiver never holds up
/// scoring. A row is claimed with a token check, so two instances never post the same row at once.
/// </summary>
public sealed class AlertWebhookSender(IServiceScopeFactory scopes, IHttpClientFactory clients, TimeProvider clock, IOptions<AlertOptions> options, ILogger<AlertWebhookSender> logger)
    : BackgroundService
{
    public const string ClientName = "alert-webhook";

    private static readonly TimeSpan ClaimFor = TimeSpan.FromMinutes(1);

    private static readonly TimeSpan LongestWait = TimeSpan.FromHours(1);

    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        if (string.IsNullOrWhiteSpace(options.Value.WebhookUrl))
        {
            return;
        }

        var poll = TimeSpan.FromSeconds(Math.Max(0.05, options.Value.WebhookPollSeconds));
        while (!stoppingToken.IsCancellationRequested)
        {
            try
            {
                await SendDueAsync(stoppingToken);
                await Task.Delay(poll, clock, stoppingToken);
            }
            catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
            {
                return;
            }
            catch (Exception e) when (e is DbUpdateException or InvalidOperationException or System.Data.Common.DbException)
            {
                logger.LogError(e, "Alert webhook delivery pass failed.");
                await Task.Delay(poll, clock, stoppingToken);
            }
        }
    }

    private async Task SendDueAsync(CancellationToken ct)
    {
        await using var scope = scopes.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<LedgerlineDbContext>();
        var now = clock.GetUtcNow();
        // Undelivered rows are few (one per new alert), so the due check runs here rather than in SQL.
        var pending = await db.AlertDeliveries.AsNoTracking().Where(d => d.DeliveredAt == null && !d.Abandoned).OrderBy(d => d.Id).Take(100).ToListAsync(ct);
        foreach (var delivery in pending.Where(d => d.NextAttemptAt <= now && (d.ClaimedUntil is null || d.ClaimedUntil < now)))
        {
            var claimed = await db.AlertDeliveries
                .Where(d => d.Id == delivery.Id && d.ClaimToken == delivery.ClaimToken && d.DeliveredAt == null)
                .ExecuteUpdateAsync(s => s.SetProperty(d => d.ClaimToken, delivery.ClaimToken + 1).SetProperty(d => d.ClaimedUntil, now + ClaimFor), ct);
            if (claimed == 1)
            {
                await DeliverAsync(db, delivery, ct);
            }
        }
    }

    private async Task DeliverAsync(LedgerlineDbContext db, AlertDelivery delivery, CancellationToken ct)
    {
        string? error;
        try
        {
            using var client = clients.CreateClient(ClientName);
            using var content = new StringContent(delivery.Payload, Encoding.UTF8, "application/json");
            using var response = await client.PostAsync(new Uri(options.Value.WebhookUrl!), content, ct);
            error = response.IsSuccessStatusCode ? null : $"The receiver answered {(int)response.StatusCode}.";
        }
        catch (HttpRequestException e)
        {
            error = e.Message;
        }
        catch (TaskCanceledException) when (!ct.IsCancellationRequested)
        {
            error = "The receiver did not answer in time.";
        }

        var now = clock.GetUtcNow();
        var attempts = delivery.Attempts + 1;
        if (error is null)
        {
            await db.AlertDeliveries.Where(d => d.Id == delivery.Id).ExecuteUpdateAsync(s => s
                .SetProperty(d => d.DeliveredAt, now).SetProperty(d => d.Attempts, attempts).SetProperty(d => d.LastError, (string?)null), ct);
            return;
        }

        var wait = TimeSpan.FromSeconds(Math.Min(options.Value.WebhookFirstRetrySeconds * Math.Pow(2, attempts - 1), LongestWait.TotalSeconds));
        var abandon = attempts >= options.Value.WebhookMaxAttempts;
        logger.LogWarning("Alert webhook delivery {Id} failed (attempt {Attempts}): {Error}", delivery.Id, attempts, error);
        await db.AlertDeliveries.Where(d => d.Id == delivery.Id).ExecuteUpdateAsync(s => s
            .SetProperty(d => d.Attempts, attempts)
            .SetProperty(d => d.NextAttemptAt, now + wait)
            .SetProperty(d => d.ClaimedUntil, (DateTimeOffset?)null)
            .SetProperty(d => d.Abandoned, abandon)
            .SetProperty(d => d.LastError, error), ct);
    }
}
