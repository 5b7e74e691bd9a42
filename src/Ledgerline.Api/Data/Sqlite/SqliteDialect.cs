using System.Data.Common;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Storage;

namespace Ledgerline.Api.Data.Sqlite;

/// <summary>
/// SQLite: one file, one writer at a time. Its default transaction takes the write lock at once
/// (<c>BEGIN IMMEDIATE</c>), which is what serialises audit appends and read-modify-writes, so
/// those locks are already held; reads run in deferred transactions beside the writer (WAL).
/// </summary>
internal sealed class SqliteDialect(SqliteLogRestart logRestart) : StoreDialect
{
    public override async Task PrepareStoreAsync(LedgerlineDbContext db, CancellationToken ct)
    {
        // WAL lets readers (reports) run beside the writer (decisions); it persists in the file.
        await db.Database.OpenConnectionAsync(ct);
        await db.Database.ExecuteSqlRawAsync("PRAGMA journal_mode=WAL;", ct);
    }

    public override void PrepareWriterConnection(DbConnection connection)
    {
        using var command = connection.CreateCommand();
        // Every score row would look its decision up again to check a reference the writer has just
        // made true by inserting the decision first. The setting lasts until the pooled connection
        // is next opened (SqlitePragmas turns it back on).
        command.CommandText = "PRAGMA foreign_keys=OFF;";
        command.ExecuteNonQuery();
        if (logRestart.TryTake())
        {
            // Copies the frames committed since the background checkpoint, so that the next batch
            // begins on a fully copied log and SQLite writes it from the start. While a reader still
            // holds older frames the copy stops short and the log carries on; the checkpointer asks
            // again a second later (see SqliteLogRestart).
            command.CommandText = "PRAGMA wal_checkpoint(PASSIVE);";
            command.ExecuteNonQuery();
        }
    }

    public override async Task<IAsyncDisposable> BeginReadSnapshotAsync(LedgerlineDbContext db, CancellationToken ct)
    {
        if (db.Database.CurrentTransaction is not null)
        {
            return NoSnapshot.Instance;
        }

        // Deferred: SQLite's default transaction takes the write lock at once, which would hold up
        // the decision log for as long as the report reads. A deferred one only reads, from the
        // snapshot its first query sees.
        await db.Database.OpenConnectionAsync(ct);
        var transaction = ((SqliteConnection)db.Database.GetDbConnection()).BeginTransaction(deferred: true);
        await db.Database.UseTransactionAsync(transaction, ct);
        return new Snapshot(db, transaction);
    }

    public override Task LockAuditChainAsync(LedgerlineDbContext db, CancellationToken ct) => Task.CompletedTask;

    public override void LockAuditChain(LedgerlineDbContext db)
    {
    }

    public override Task LockRowsAsync<TEntity>(LedgerlineDbContext db, IReadOnlyCollection<Guid> ids, CancellationToken ct) => Task.CompletedTask;

    public override async Task BulkInsertAsync<TEntity>(LedgerlineDbContext db, IReadOnlyList<TEntity> rows, CancellationToken ct)
    {
        // In-process, a prepared statement per row is as fast as SQLite inserts go.
        var insert = ModelStatement.Insert<TEntity>(db);
        await using var command = insert.CreateCommand(db.Database.GetDbConnection(), db.Database.CurrentTransaction?.GetDbTransaction());
        foreach (var row in rows)
        {
            insert.Execute(command, row);
        }
    }

    public override IQueryable<TEntity> InStorageOrder<TEntity>(LedgerlineDbContext db)
    {
        // NOT INDEXED: a straight read of the table; looking each row up from an index, in index
        // order, took ten times as long on a million rows.
        var table = db.Model.FindEntityType(typeof(TEntity))!.GetTableName();
        var straight = "SELECT * FROM \"" + table + "\" NOT INDEXED";
        return db.Set<TEntity>().FromSqlRaw(straight);
    }

    private sealed class Snapshot(LedgerlineDbContext db, SqliteTransaction transaction) : IAsyncDisposable
    {
        public async ValueTask DisposeAsync()
        {
            await db.Database.UseTransactionAsync(null);
            await transaction.DisposeAsync();
            await db.Database.CloseConnectionAsync();
        }
    }
}
