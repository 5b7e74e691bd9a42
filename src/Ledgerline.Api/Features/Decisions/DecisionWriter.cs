using System.Data.Common;
using System.Threading.Channels;
using Ledgerline.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Metadata;
using Microsoft.EntityFrameworkCore.Storage;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>
/// Group commit for the decision log. Requests hand their scored decision to one writer, which
/// takes everything waiting, writes it in one transaction and completes each request only after
/// the commit. Concurrent requests thus share one durable commit (one fsync under SQLite's
/// synchronous=FULL) instead of paying one each.
/// </summary>
/// <remarks>
/// Inserts are plain parameterised SQL built from the EF model (table, column names and value
/// conversions come from the model, so SQLite and PostgreSQL both work). <c>ON CONFLICT DO
/// NOTHING</c> (SQLite 3.24+, PostgreSQL 9.5+) turns a unique-index collision — a duplicate
/// idempotency key or application id, from this batch or from another instance — into "not
/// inserted" for that one decision, without failing the others in the batch.
/// </remarks>
public sealed class DecisionWriter : IHostedService, IDisposable
{
    /// <summary>Most decisions per transaction; larger batches only lengthen the wait of the first.</summary>
    public const int MaxBatch = 1024;

    private readonly Channel<Pending> _queue = Channel.CreateUnbounded<Pending>(new UnboundedChannelOptions { SingleReader = true });
    private readonly IServiceScopeFactory _scopes;
    private readonly SqliteLogRestart _logRestart;
    private readonly ILogger<DecisionWriter> _logger;
    private Thread? _thread;

    public DecisionWriter(IServiceScopeFactory scopes, SqliteLogRestart logRestart, ILogger<DecisionWriter> logger)
    {
        _scopes = scopes;
        _logRestart = logRestart;
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
        var statements = InsertStatements.For(db);
        db.Database.OpenConnection();
        try
        {
            var connection = db.Database.GetDbConnection();
            if (db.Database.IsSqlite())
            {
                // Every score row would look its decision up again to check a reference this
                // method has just made true by inserting the decision first. The setting lasts
                // until the pooled connection is next opened (SqlitePragmas turns it back on).
                db.Database.ExecuteSqlRaw("PRAGMA foreign_keys=OFF;");
                if (_logRestart.TryTake())
                {
                    CopyRestOfLog(connection);
                }
            }

            using var transaction = connection.BeginTransaction();
            if (connection.CanCreateBatch)
            {
                var batched = WriteBatched(statements, connection, transaction, batch);
                transaction.Commit();
                return batched;
            }

            using var insertDecision = statements.Decision.CreateCommand(connection, transaction);
            using var insertScore = statements.Score.CreateCommand(connection, transaction);
            var inserted = new bool[batch.Count];
            for (var i = 0; i < batch.Count; i++)
            {
                var decision = batch[i].Decision;
                if (!statements.Decision.Execute(insertDecision, decision))
                {
                    continue;
                }

                inserted[i] = true;
                foreach (var score in decision.Scores)
                {
                    statements.Score.Execute(insertScore, score);
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
    /// Copies the frames committed since the background checkpoint, so that the next batch begins on
    /// a fully copied log and SQLite writes it from the start. While a reader (a long report) still
    /// holds older frames the copy stops short and the log carries on; the checkpointer asks again a
    /// second later rather than this writer paying for a copy before every batch meanwhile.
    /// </summary>
    private static void CopyRestOfLog(DbConnection connection)
    {
        using var command = connection.CreateCommand();
        command.CommandText = "PRAGMA wal_checkpoint(PASSIVE);";
        command.ExecuteNonQuery();
    }

    /// <summary>
    /// Where the provider batches statements (PostgreSQL; a server is a network round trip away):
    /// all decisions in one round trip, then the scores of those inserted in a second, instead of
    /// one round trip per row.
    /// </summary>
    private static bool[] WriteBatched(InsertStatements statements, DbConnection connection, DbTransaction transaction, List<Pending> batch)
    {
        using var parameters = connection.CreateCommand();
        using var decisions = connection.CreateBatch();
        decisions.Transaction = transaction;
        foreach (var pending in batch)
        {
            decisions.BatchCommands.Add(statements.Decision.CreateBatchCommand(decisions, parameters, pending.Decision));
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
                    scores.BatchCommands.Add(statements.Score.CreateBatchCommand(scores, parameters, score));
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

    /// <summary>The two insert statements, built once per provider from the EF model.</summary>
    private sealed class InsertStatements(InsertStatement decision, InsertStatement score)
    {
        private static InsertStatements? s_cached;

        public InsertStatement Decision { get; } = decision;

        public InsertStatement Score { get; } = score;

        public static InsertStatements For(LedgerlineDbContext db)
        {
            var cached = s_cached;
            if (cached is not null && cached.Decision.ProviderName == db.Database.ProviderName)
            {
                return cached;
            }

            var sql = db.GetService<ISqlGenerationHelper>();
            cached = new InsertStatements(
                new InsertStatement(db.Model.FindEntityType(typeof(Decision))!, sql, db.Database.ProviderName!),
                new InsertStatement(db.Model.FindEntityType(typeof(DecisionScore))!, sql, db.Database.ProviderName!));
            s_cached = cached;
            return cached;
        }
    }

    private sealed class InsertStatement
    {
        private readonly (IProperty Property, IClrPropertyGetter Getter, RelationalTypeMapping Mapping, string Name)[] _columns;
        private readonly string _sql;

        public InsertStatement(IEntityType entity, ISqlGenerationHelper sql, string providerName)
        {
            ProviderName = providerName;
            // Integer keys are generated by the database; everything else comes from the entity.
            _columns = entity.GetProperties()
                .Where(p => !(p.IsPrimaryKey() && p.ClrType == typeof(long)))
                .Select((p, i) => (p, p.GetGetter(), p.GetRelationalTypeMapping(), $"@p{i}"))
                .ToArray();
            var table = sql.DelimitIdentifier(entity.GetTableName()!, entity.GetSchema());
            var columns = string.Join(", ", _columns.Select(c => sql.DelimitIdentifier(c.Property.GetColumnName())));
            var values = string.Join(", ", _columns.Select(c => c.Name));
            _sql = $"INSERT INTO {table} ({columns}) VALUES ({values}) ON CONFLICT DO NOTHING";
        }

        public string ProviderName { get; }

        public DbCommand CreateCommand(DbConnection connection, DbTransaction transaction)
        {
            var command = connection.CreateCommand();
            command.Transaction = transaction;
            command.CommandText = _sql;
            return command;
        }

        /// <summary>One row's insert as a batch command; <paramref name="parameters"/> only manufactures parameters.</summary>
        public DbBatchCommand CreateBatchCommand(DbBatch batch, DbCommand parameters, object entity)
        {
            var command = batch.CreateBatchCommand();
            command.CommandText = _sql;
            foreach (var (property, getter, mapping, name) in _columns)
            {
                command.Parameters.Add(mapping.CreateParameter(parameters, name, getter.GetClrValueUsingContainingEntity(entity), property.IsNullable));
            }

            return command;
        }

        /// <summary>Inserts one row; false when a unique index already held its key.</summary>
        public bool Execute(DbCommand command, object entity)
        {
            for (var i = 0; i < _columns.Length; i++)
            {
                var (property, getter, mapping, name) = _columns[i];
                ReusedParameters.Set(command, i, mapping, name, getter.GetClrValueUsingContainingEntity(entity), property.IsNullable);
            }

            return command.ExecuteNonQuery() == 1;
        }
    }
}
