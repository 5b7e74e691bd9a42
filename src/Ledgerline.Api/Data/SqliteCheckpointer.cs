using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Data;

/// <summary>
/// Copies the SQLite write-ahead log back into the database file once a second, on its own
/// thread. Left to SQLite, the commit that crosses the log's size threshold does this copy (and
/// its fsync) itself, so one decision batch or outcome request in a thousand pages would wait
/// for all of it; connections therefore run with <c>wal_autocheckpoint=0</c> (see
/// <see cref="SqlitePragmas"/>) and this service takes the work off the request path.
/// </summary>
internal sealed partial class SqliteCheckpointer(IServiceScopeFactory scopes, ILogger<SqliteCheckpointer> logger) : BackgroundService
{
    public static readonly TimeSpan Interval = TimeSpan.FromSeconds(1);

    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        using var timer = new PeriodicTimer(Interval);
        try
        {
            while (await timer.WaitForNextTickAsync(stoppingToken))
            {
                await CheckpointAsync(stoppingToken);
            }
        }
        catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
        {
            // Stopping: the last connection to close checkpoints the rest.
        }
    }

    private async Task CheckpointAsync(CancellationToken ct)
    {
        try
        {
            await using var scope = scopes.CreateAsyncScope();
            var db = scope.ServiceProvider.GetRequiredService<LedgerlineDbContext>();
            // PASSIVE copies what no reader still needs and never blocks writers or readers.
            await db.Database.ExecuteSqlRawAsync("PRAGMA wal_checkpoint(PASSIVE);", ct);
        }
        catch (Exception e) when (e is Microsoft.Data.Sqlite.SqliteException or InvalidOperationException)
        {
            LogFailed(logger, e);
        }
    }

    [LoggerMessage(Level = LogLevel.Warning, Message = "Checkpointing the SQLite write-ahead log failed; retrying in a second")]
    private static partial void LogFailed(ILogger logger, Exception e);
}
