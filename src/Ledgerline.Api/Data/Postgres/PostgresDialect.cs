using System.Data;
using System.Data.Common;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Storage;
using Npgsql;

namespace Ledgerline.Api.Data.Postgres;

/// <summary>
/// PostgreSQL: several service instances share one server, so whatever one instance serialises
/// must be serialised in the database (advisory and row locks), and bulk rows go in by binary COPY.
/// </summary>
internal sealed class PostgresDialect : StoreDialect
{
    /// <summary>Arbitrary constant naming the audit chain's advisory lock.</summary>
    private const long AuditLockId = 0x4c65_6467_4175_6431;

    public override Task PrepareStoreAsync(LedgerlineDbContext db, CancellationToken ct) => Task.CompletedTask;

    public override void PrepareWriterConnection(DbConnection connection)
    {
    }

    public override async Task<IAsyncDisposable> BeginReadSnapshotAsync(LedgerlineDbContext db, CancellationToken ct) =>
        db.Database.CurrentTransaction is not null
            ? NoSnapshot.Instance
            : await db.Database.BeginTransactionAsync(IsolationLevel.RepeatableRead, ct);

    public override Task LockAuditChainAsync(LedgerlineDbContext db, CancellationToken ct) =>
        db.Database.ExecuteSqlAsync($"SELECT pg_advisory_xact_lock({AuditLockId})", ct);

    public override void LockAuditChain(LedgerlineDbContext db) =>
        db.Database.ExecuteSql($"SELECT pg_advisory_xact_lock({AuditLockId})");

    public override async Task LockRowsAsync<TEntity>(LedgerlineDbContext db, IReadOnlyCollection<Guid> ids, CancellationToken ct)
    {
        // In key order, so two instances locking overlapping sets cannot deadlock.
        var sorted = ids.Order().ToArray();
        var sql = db.GetService<ISqlGenerationHelper>();
        var table = db.Model.FindEntityType(typeof(TEntity))!.GetTableName()!;
        // The table name comes from the model, never from input.
        var lockRows = "SELECT 1 FROM " + sql.DelimitIdentifier(table) + " WHERE \"Id\" = ANY(@ids) FOR UPDATE";
        await db.Database.ExecuteSqlRawAsync(lockRows, [new NpgsqlParameter("ids", sorted)], ct);
    }

    public override async Task BulkInsertAsync<TEntity>(LedgerlineDbContext db, IReadOnlyList<TEntity> rows, CancellationToken ct)
    {
        if (rows.Count == 0)
        {
            return;
        }

        // One stream per call instead of a round trip per row; the columns, names and value
        // conversions come from the model, like every other statement (ModelStatement).
        var insert = ModelStatement.Insert<TEntity>(db);
        var sql = db.GetService<ISqlGenerationHelper>();
        var table = sql.DelimitIdentifier(insert.Entity.GetTableName()!, insert.Entity.GetSchema());
        var columns = insert.Columns;
        var copy = $"COPY {table} ({string.Join(", ", columns.Select(c => sql.DelimitIdentifier(c.Name)))}) FROM STDIN (FORMAT BINARY)";
        var types = columns.Select(c => StoreTypeName(c.Mapping.StoreType)).ToArray();
        var connection = (NpgsqlConnection)db.Database.GetDbConnection();
        await using var writer = await connection.BeginBinaryImportAsync(copy, ct);
        foreach (var row in rows)
        {
            await writer.StartRowAsync(ct);
            for (var i = 0; i < columns.Count; i++)
            {
                var value = columns[i].ToProvider(columns[i].Get(row));
                if (value is null)
                {
                    await writer.WriteNullAsync(ct);
                }
                else
                {
                    // timestamptz takes UTC only.
                    await writer.WriteAsync(value is DateTimeOffset at ? at.UtcDateTime : value, types[i], ct);
                }
            }
        }

        await writer.CompleteAsync(ct);
    }

    public override IQueryable<TEntity> InStorageOrder<TEntity>(LedgerlineDbContext db) => db.Set<TEntity>();

    /// <summary>"character varying(16)" → "character varying": COPY names the type, not its length.</summary>
    private static string StoreTypeName(string storeType) =>
        storeType.IndexOf('(', StringComparison.Ordinal) is var open and > 0 ? storeType[..open] : storeType;
}
