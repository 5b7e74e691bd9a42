using System.Data.Common;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Data.Sqlite;

/// <summary>
/// Copies the SQLite write-ahead log back into the database file once a second, on its own
/// thread. Left to SQLite, the commit that crosses the log's size threshold does this copy (and
/// its fsync) itself, so one decision batch or outcome request in a thousand pages would wait
/// for all of it; connections therefore run with <c>wal_autocheckpoint=0</c> (see
/// <see cref="SqlitePragmas"/>) and this service takes the work off the request path. A long log
/// is then handed to <see cref="SqliteLogRestart"/> so that it starts over.
/// </summary>
internal sealed partial class SqliteCheckpointer(IServiceScopeFactory scopes, SqliteLogRestart restart, ILogger<SqliteCheckpointer> logger) : BackgroundService
{
    public static readonly TimeSpan Interval = TimeSpan.FromSeconds(1);

    /// <summary>A pass copying this few frames (1 MB) is as close as the copy gets to the writer.</summary>
    private const long SmallPass = 256;

    private const int MaxPasses = 8;

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
            await db.Database.OpenConnectionAsync(ct);
            await using var command = db.Database.GetDbConnection().CreateCommand();
            // PASSIVE copies what no reader still needs and never blocks writers or readers. Its row
            // says whether it was blocked, how many frames the log holds and how many are copied.
            // Each pass copies what was committed during the one before, so a few passes leave the
            // decision-log writer only a moment's frames to copy when it restarts the log.
            command.CommandText = "PRAGMA wal_checkpoint(PASSIVE);";
            long copiedBefore = 0, frames = 0;
            for (var pass = 0; pass < MaxPasses; pass++)
            {
                (frames, var copied) = await PassAsync(command, ct);
                var copiedNow = copied >= copiedBefore ? copied - copiedBefore : copied;
                copiedBefore = copied;
                if (copiedNow <= SmallPass)
                {
                    break;
                }
            }

            // Asked even when the passes did not catch up (a machine short of CPU, a reader still on
            // older frames): the writer then copies more at once, but the log stops growing.
            if (frames >= restart.FramesWorthRestarting)
            {
                restart.Request();
            }
        }
        catch (Exception e) when (e is Microsoft.Data.Sqlite.SqliteException or InvalidOperationException)
        {
            LogFailed(logger, e);
        }
    }

    private static async Task<(long Frames, long Copied)> PassAsync(DbCommand command, CancellationToken ct)
    {
        await using var result = await command.ExecuteReaderAsync(ct);
        return await result.ReadAsync(ct) && result.GetInt64(0) == 0 ? (result.GetInt64(1), result.GetInt64(2)) : (0, 0);
    }

    [LoggerMessage(Level = LogLevel.Warning, Message = "Checkpointing the SQLite write-ahead log failed; retrying in a second")]
    private static partial void LogFailed(ILogger logger, Exception e);
}
