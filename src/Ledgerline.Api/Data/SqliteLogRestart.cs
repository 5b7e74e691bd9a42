namespace Ledgerline.Api.Data;

/// <summary>
/// Lets the SQLite write-ahead log start over while decisions keep arriving. SQLite rewinds the
/// log only when a write transaction begins after every frame has been copied back; a background
/// checkpoint never sees that moment while the decision log commits many times a second, so the
/// log grew without end (1.6 GB in 20 s of the scoring benchmark, every commit extending the file).
/// <see cref="SqliteCheckpointer"/> copies the bulk without blocking anyone and then asks; the
/// decision-log writer, between two batches, copies the few frames committed meanwhile, and its
/// next batch writes from the start of the log.
/// </summary>
public sealed class SqliteLogRestart
{
    /// <summary>A log shorter than this (4 MB of pages) is left to grow until the next quiet moment.</summary>
    public const long FramesWorthRestarting = 1024;

    private int _wanted;

    public void Request() => Volatile.Write(ref _wanted, 1);

    /// <summary>True once per request: the caller copies the rest of the log before its next write.</summary>
    public bool TryTake() => Interlocked.Exchange(ref _wanted, 0) == 1;
}
