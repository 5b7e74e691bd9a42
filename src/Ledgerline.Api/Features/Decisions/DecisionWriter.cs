using System.Data.Common;
using System.Threading.Channels;
using Ledgerline.Api.Data;
using Ledgerline.Api.Ledger;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>
/// Group commit for the decision log. Requests hand their scored decision to one writer, which
/// takes everything waiting, writes it in one transaction and completes each request only after
/// the commit. Concurrent requests thus share one durable commit (one fsync under SQLite's
/// synchronous=FULL) instead of paying one each.
/// </summary>
/// <remarks>
/// Inserts are plain parameterised SQL built from the EF model (<see cref="ModelStatement"/>), so
/// SQLite and PostgreSQL both work; the store's own upkeep between batches is the dialect's
/// (<see cref="StoreDialect.PrepareWriterConnection"/>). <c>ON CONFLICT DO NOTHING</c> (SQLite 3.24+, PostgreSQL 9.5+) turns a unique-index collision — a duplicate
/// idempotency key or application id, from this batch or from another instance — into "not
/// inserted" for that one decision, without failing the others in the batch.
/// </remarks>
public sealed class DecisionWriter : IHostedService, IDisposable
{
    /// <summary>Most decisions per transaction; larger batches only lengthen the wait of the first.</summary>
    public const int MaxBatch = 1024;

    private readonly Channel<Pending> _queue = Channel.CreateUnbounded<Pending>(new UnboundedChannelOptions { SingleReader = true });
    private readonly IServiceScopeFactory _scopes;
    private readonly ILogger<DecisionWriter> _logger;
    private Thread? _thread;

    public DecisionWriter(IServiceScopeFactory scopes, ILogger<DecisionWriter> logger)
    {
        _scopes = scopes;
        _logger = logger;
    }

    /// <summary>
    /// Logs decisions durably. Each task completes after the commit that holds its decision: true
    /// when it was inserted, false when a decision with its idempotency key or application id
    /// already existed (the caller resolves that as a replay or a conflict).
    /// </summary>
    public Task<bool> WriteAsync(Decision decision)
    {
        var pending = new Pending(decision);
        if (!_queue.Writer.TryWrite(pending))
        {
            throw new InvalidOperationException("The decision log is shutting down; retry on another instance.");
        }

        return pending.Done.Task;
    }

    public Task StartAsync(CancellationToken cancellationToken)
    {
        // A dedicated thread: commits block on fsync, and must not hold a thread-pool thread.
        _thread = new Thread(Run) { IsBackground = true, Name = "decision-log-writer" };
        _thread.Start();
        return Task.CompletedTask;
    }

    public Task StopAsync(CancellationToken cancellationToken)
    {
        // Requests already queued are still written; the thread ends when the queue is empty.
        _queue.Writer.TryComplete();
        _thread?.Join(TimeSpan.FromSeconds(10));
        return Task.CompletedTask;
    }

    public void Dispose() => _queue.Writer.TryComplete();

    private void Run()
    {
        var reader = _queue.Reader;
        var batch = new List<Pending>(MaxBatch);
        while (reader.WaitToReadAsync().AsTask().GetAwaiter().GetResult())
        {
            batch.Clear();
            while (batch.Count < MaxBatch && reader.TryRead(out var item))
            {
                batch.Add(item);
            }

            try
            {
                var inserted = Write(batch);
                for (var i = 0; i < batch.Count; i++)
                {
                    batch[i].Done.TrySetResult(inserted[i]);
                }
            }
            catch (Exception e) when (e is DbException or InvalidOperationException)
            {
                _logger.LogError(e, "Writing {Count} decisions failed; none of them was committed", batch.Count);
                foreach (var item in batch)
                {
                    item.Done.TrySetException(e);
                }
            }
        }
    }

    private bool[] Write(List<Pending> batch)
    {
        using var scope = _scopes.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<LedgerlineDbContext>();
        var insertDecision = ModelStatement.Insert<Decision>(db, skipConflicts: true);
        var insertScore = ModelStatement.Insert<DecisionScore>(db);
        db.Database.OpenConnection();
        try
        {
            var connection = db.Database.GetDbConnection();
            StoreDialect.Of(db).PrepareWriterConnection(connection);
            using var transaction = connection.BeginTransaction();
            if (connection.CanCreateBatch)
            {
                var batched = WriteBatched(insertDecision, insertScore, connection, transaction, batch);
                transaction.Commit();
                return batched;
            }

            using var decisionCommand = insertDecision.CreateCommand(connection, transaction);
            using var scoreCommand = insertScore.CreateCommand(connection, transaction);
            var inserted = new bool[batch.Count];
            for (var i = 0; i < batch.Count; i++)
            {
                var decision = batch[i].Decision;
                if (insertDecision.Execute(decisionCommand, decision) != 1)
                {
                    continue;
                }

                inserted[i] = true;
                foreach (var score in decision.Scores)
                {
                    insertScore.Execute(scoreCommand, score);
                }
            }

            transaction.Commit();
            return inserted;
        }
        finally
        {
            db.Database.CloseConnection();
        }
    }

    /// <summary>
    /// Where the provider batches statements (PostgreSQL; a server is a network round trip away):
    /// all decisions in one round trip, then the scores of those inserted in a second, instead of
    /// one round trip per row.
    /// </summary>
    private static bool[] WriteBatched(ModelStatement insertDecision, ModelStatement insertScore, DbConnection connection, DbTransaction transaction, List<Pending> batch)
    {
        using var parameters = connection.CreateCommand();
        using var decisions = connection.CreateBatch();
        decisions.Transaction = transaction;
        foreach (var pending in batch)
        {
            decisions.BatchCommands.Add(insertDecision.CreateBatchCommand(decisions, parameters, pending.Decision));
        }

        decisions.ExecuteNonQuery();
        var inserted = new bool[batch.Count];
        using var scores = connection.CreateBatch();
        scores.Transaction = transaction;
        for (var i = 0; i < batch.Count; i++)
        {
            inserted[i] = decisions.BatchCommands[i].RecordsAffected == 1;
            if (inserted[i])
            {
                foreach (var score in batch[i].Decision.Scores)
                {
                    scores.BatchCommands.Add(insertScore.CreateBatchCommand(scores, parameters, score));
                }
            }
        }

        if (scores.BatchCommands.Count > 0)
        {
            scores.ExecuteNonQuery();
        }

        return inserted;
    }

    private sealed class Pending(Decision decision)
    {
        public Decision Decision { get; } = decision;

        // Continuations run on the thread pool, never on the writer thread.
        public TaskCompletionSource<bool> Done { get; } = new(TaskCreationOptions.RunContinuationsAsynchronously);
    }
}
