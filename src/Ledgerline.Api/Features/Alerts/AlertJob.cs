using Ledgerline.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace Ledgerline.Api.Features.Alerts;

/// <summary>
/// Evaluates every scorecard's alerts every <c>Alerts:IntervalMinutes</c>. Every instance may run it:
/// alerts are raised once by the database's unique index, not by this job being alone.
/// </summary>
public sealed class AlertJob(IServiceScopeFactory scopes, TimeProvider clock, IOptions<AlertOptions> options, ILogger<AlertJob> logger) : BackgroundService
{
    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        var minutes = options.Value.IntervalMinutes;
        if (minutes <= 0)
        {
            return;
        }

        while (!stoppingToken.IsCancellationRequested)
        {
            try
            {
                await Task.Delay(TimeSpan.FromMinutes(minutes), clock, stoppingToken);
                await EvaluateAllAsync(stoppingToken);
            }
            catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
            {
                return;
            }
            catch (Exception e) when (e is DbUpdateException or InvalidOperationException or System.Data.Common.DbException)
            {
                logger.LogError(e, "Alert evaluation failed; the next run is in {Minutes} minutes.", minutes);
            }
        }
    }

    private async Task EvaluateAllAsync(CancellationToken ct)
    {
        await using var scope = scopes.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<LedgerlineDbContext>();
        var evaluator = scope.ServiceProvider.GetRequiredService<AlertEvaluator>();
        foreach (var scorecard in await db.Scorecards.AsNoTracking().OrderBy(s => s.Id).ToListAsync(ct))
        {
            await evaluator.EvaluateAsync(scorecard, ct);
        }
    }
}
