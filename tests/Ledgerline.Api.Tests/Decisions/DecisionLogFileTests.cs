#if !POSTGRES
using System.Buffers.Binary;
using System.Diagnostics;
using Ledgerline.Api.Tests.Infrastructure;
using Microsoft.Data.Sqlite;

namespace Ledgerline.Api.Tests.Decisions;

/// <summary>The SQLite write-ahead log under a decision load that never pauses.</summary>
public sealed class DecisionLogFileTests
{
    [Fact]
    public async Task Decide_UnderSustainedLoad_TheWriteAheadLogStartsOver()
    {
        // A 4 MB log is restarted: the default waits for 256 MB, more than the test writes.
        await using var app = new LedgerlineApp(new Dictionary<string, string?> { ["Database:SqliteLogRestartFrames"] = "1024" });
        var setup = await LiveScoringSetup.WithPlanAsync(app);
        var log = new SqliteConnectionStringBuilder(app.ConnectionString).DataSource + "-wal";
        // An idle connection held open keeps the log file itself: when the last connection closes
        // (other tests clear every connection pool), SQLite deletes the log, and a new file would look
        // like a restart.
        using var keepsLogFile = app.OpenDatabase();
        using var stop = new CancellationTokenSource();
        var failures = 0;
        var clients = Enumerable.Range(0, 16).Select(client => Task.Run(async () =>
        {
            for (var n = 0; !stop.IsCancellationRequested; n++)
            {
                using var response = await setup.DecideAsync(LiveScoringSetup.Application($"LOAD-{client}-{n}"));
                if (!response.IsSuccessStatusCode)
                {
                    Interlocked.Increment(ref failures);
                }
            }
        })).ToList();

        // Once the load runs, nothing pauses the writer long enough for a background checkpoint to
        // catch up by itself; the restart has to be arranged.
        await Task.Delay(TimeSpan.FromSeconds(1.5));
        var before = Salt(log);
        var watch = Stopwatch.StartNew();
        var after = before;
        while (after == before && watch.Elapsed < TimeSpan.FromSeconds(8))
        {
            await Task.Delay(TimeSpan.FromMilliseconds(100));
            after = Salt(log);
        }

        await stop.CancelAsync();
        await Task.WhenAll(clients);

        Assert.Equal(0, failures);
        Assert.True(after != before, $"the log did not start over in 8 s of load (its first salt stayed {before})");
    }

    [Fact]
    public async Task Start_LogRestartBelow64Frames_FailsNamingTheSetting()
    {
        await using var app = new LedgerlineApp(new Dictionary<string, string?> { ["Database:SqliteLogRestartFrames"] = "10" });

        var error = Assert.ThrowsAny<Exception>(() => app.CreateClient());

        Assert.Contains("SqliteLogRestartFrames", error.ToString(), StringComparison.Ordinal);
    }

    /// <summary>
    /// The first salt in bytes 16–19 of the log's header (big-endian), which SQLite increments each
    /// time the log starts over. (The checkpoint sequence number in bytes 12–15 is counted by each
    /// connection for itself, so it does not rise when another pooled connection restarts the log.)
    /// Source: "Database File Format", section "WAL File Format", sqlite.org/fileformat2.html.
    /// </summary>
    private static uint Salt(string log)
    {
        using var file = new FileStream(log, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
        Span<byte> header = stackalloc byte[20];
        file.ReadExactly(header);
        return BinaryPrimitives.ReadUInt32BigEndian(header[16..]);
    }
}
#endif
