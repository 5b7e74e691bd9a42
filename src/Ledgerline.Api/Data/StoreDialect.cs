using System.Data.Common;
using Microsoft.EntityFrameworkCore.Infrastructure;

namespace Ledgerline.Api.Data;

/// <summary>
/// What features need from the store that SQL does not say the same way on SQLite and PostgreSQL:
/// features say what they need here, <c>Data/Sqlite</c> and <c>Data/Postgres</c> say how. One
/// instance per process, chosen by <c>Database:Provider</c>.
/// </summary>
public abstract class StoreDialect
{
    /// <summary>The dialect of the store a context is connected to.</summary>
    public static StoreDialect Of(LedgerlineDbContext db) => db.GetService<StoreDialect>();

    /// <summary>Run once on a new store before migrations (SQLite: write-ahead logging).</summary>
    public abstract Task PrepareStoreAsync(LedgerlineDbContext db, CancellationToken ct);

    /// <summary>
    /// Run by the decision-log writer on its open connection before each batch's transaction:
    /// the moment for maintenance that must sit between two commits.
    /// </summary>
    public abstract void PrepareWriterConnection(DbConnection connection);

    /// <summary>
    /// A read snapshot shared by several queries of one report that never holds up the decision
    /// log; nothing when the context already has a transaction (the caller's snapshot stands).
    /// </summary>
    public abstract Task<IAsyncDisposable> BeginReadSnapshotAsync(LedgerlineDbContext db, CancellationToken ct);

    /// <summary>Serialises appends to the audit chain across every instance, inside the current transaction.</summary>
    public abstract Task LockAuditChainAsync(LedgerlineDbContext db, CancellationToken ct);

    /// <inheritdoc cref="LockAuditChainAsync"/>
    public abstract void LockAuditChain(LedgerlineDbContext db);

    /// <summary>
    /// Locks the given rows of a table with a <c>Guid</c> key until the current transaction ends,
    /// so a read-modify-write on them from another instance waits instead of overwriting.
    /// </summary>
    public abstract Task LockRowsAsync<TEntity>(LedgerlineDbContext db, IReadOnlyCollection<Guid> ids, CancellationToken ct)
        where TEntity : class;

    /// <summary>Inserts many rows of one entity inside the current transaction, the fastest way the store offers.</summary>
    public abstract Task BulkInsertAsync<TEntity>(LedgerlineDbContext db, IReadOnlyList<TEntity> rows, CancellationToken ct)
        where TEntity : class;

    /// <summary>A table read in the store's own order, for reports that stream every row of a range.</summary>
    public abstract IQueryable<TEntity> InStorageOrder<TEntity>(LedgerlineDbContext db)
        where TEntity : class;

    /// <summary>No snapshot to end: the caller already holds a transaction.</summary>
    protected sealed class NoSnapshot : IAsyncDisposable
    {
        public static readonly NoSnapshot Instance = new();

        public ValueTask DisposeAsync() => ValueTask.CompletedTask;
    }
}
