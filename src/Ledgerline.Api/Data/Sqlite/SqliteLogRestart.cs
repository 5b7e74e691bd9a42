using Microsoft.Extensions.Options;

namespace Ledgerline.Api.Data.Sqlite;

/// <summary>
/// Lets the SQLite write-ahead log start over while decisions keep arriving. SQLite rewinds the
/// log only when a write transaction begins after every frame has been copied back; a background
/// checkpoint never sees that moment while the decision log commits many times a second, so the
/// log grew without end (1.6 GB in 20 s of the scoring benchmark, every commit extending the file).
/// <see cref="SqliteCheckpointer"/> copies the bulk without blocking anyone and then asks; the
/// decision-log writer, between two batches, copies the few frames committed meanwhile, and its
/// next batch writes from the start of the log.
/// </summary>
public sealed class SqliteLogRestart(IOptions<DatabaseOptions> options)
{
    private int _wanted;

    /// <summary>
    /// The log is restarted once it holds this many frames (<c>Database:SqliteLogRestartFrames</c>,
    /// 256 MB of 4 KB pages by default): each restart holds the decision log for a copy and an fsync
    /// of the database file (a median 11 ms, up to ~60 ms under full load), so restarting every
    /// second showed in the 99th percentile; at the scoring benchmark's load the default restarts
    /// every two to three seconds.
    /// </summary>
    public long FramesWorthRestarting { get; } = options.Value.SqliteLogRestartFrames;

    public void Request() => Volatile.Write(ref _wanted, 1);

    /// <summary>True once per request: the caller copies the rest of the log before its next write.</summary>
    public bool TryTake() => Interlocked.Exchange(ref _wanted, 0) == 1;
}
