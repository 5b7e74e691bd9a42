using System.Security.Cryptography;
using System.Text;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Data.Audit;

/// <summary>
/// Links pending audit entries onto the end of the chain inside the transaction that stores the
/// change they describe. Appends are serialised across every instance by the store's audit lock
/// (<see cref="StoreDialect.LockAuditChainAsync"/>). The unique sequence index is the backstop:
/// a second writer that somehow read the same tail fails instead of forking the chain.
/// </summary>
public static class AuditChain
{
    public static readonly string GenesisHash = new('0', 64);

    /// <summary>
    /// True when the pending changes carry audit entries. Added entities are tracked the moment
    /// they are added, so change detection is skipped: the scoring hot path saves without entries.
    /// </summary>
    public static bool HasPending(LedgerlineDbContext db)
    {
        var detect = db.ChangeTracker.AutoDetectChangesEnabled;
        db.ChangeTracker.AutoDetectChangesEnabled = false;
        try
        {
            return db.ChangeTracker.Entries<AuditEntry>().Any(e => e.State == EntityState.Added);
        }
        finally
        {
            db.ChangeTracker.AutoDetectChangesEnabled = detect;
        }
    }

    /// <summary>Runs <paramref name="save"/> with the pending entries linked to the chain, in one transaction.</summary>
    public static async Task<int> SaveAsync(LedgerlineDbContext db, Func<Task<int>> save, CancellationToken ct)
    {
        var owned = db.Database.CurrentTransaction is null ? await db.Database.BeginTransactionAsync(ct) : null;
        try
        {
            await StoreDialect.Of(db).LockAuditChainAsync(db, ct);

            var tail = await db.AuditEntries.AsNoTracking().OrderByDescending(e => e.Sequence)
                .Select(e => new ChainTail(e.Sequence, e.EntryHash)).FirstOrDefaultAsync(ct);
            Link(db, tail);
            var written = await save();
            if (owned is not null)
            {
                await owned.CommitAsync(ct);
            }

            return written;
        }
        finally
        {
            if (owned is not null)
            {
                await owned.DisposeAsync();
            }
        }
    }

    /// <summary>The synchronous twin of <see cref="SaveAsync"/>.</summary>
    public static int Save(LedgerlineDbContext db, Func<int> save)
    {
        using var owned = db.Database.CurrentTransaction is null ? db.Database.BeginTransaction() : null;
        StoreDialect.Of(db).LockAuditChain(db);

        var tail = db.AuditEntries.AsNoTracking().OrderByDescending(e => e.Sequence)
            .Select(e => new ChainTail(e.Sequence, e.EntryHash)).FirstOrDefault();
        Link(db, tail);
        var written = save();
        owned?.Commit();
        return written;
    }

    /// <summary>
    /// The SHA-256 (hex, lower case) of an entry's canonical form: the UTF-8 text
    /// <c>ledgerline-audit-v1\n</c> followed, for each of sequence, at, actor, action, subject,
    /// contentHash and previousHash in that order, by the field's UTF-8 byte length in decimal,
    /// a colon, the field, and a line feed. The sequence is written in decimal; the time as UTC
    /// <c>yyyy-MM-ddTHH:mm:ss.ffffffZ</c> (always six decimals). Length prefixes make the form unambiguous whatever the
    /// fields contain, and any language can rebuild it.
    /// </summary>
    public static string HashEntry(AuditEntry entry)
    {
        var text = new StringBuilder("ledgerline-audit-v1\n");
        foreach (var field in new[]
        {
            entry.Sequence.ToString(System.Globalization.CultureInfo.InvariantCulture),
            entry.At.ToString("yyyy-MM-dd'T'HH:mm:ss.ffffff'Z'", System.Globalization.CultureInfo.InvariantCulture),
            entry.Actor,
            entry.Action,
            entry.Subject,
            entry.ContentHash,
            entry.PreviousHash,
        })
        {
            text.Append(Encoding.UTF8.GetByteCount(field)).Append(':').Append(field).Append('\n');
        }

        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text.ToString())));
    }

    /// <summary>Whole microseconds in UTC: PostgreSQL keeps no finer time, and the hash must replay there.</summary>
    public static DateTime Normalise(DateTime utc) =>
        new(utc.Ticks - (utc.Ticks % 10), DateTimeKind.Utc);

    private static void Link(LedgerlineDbContext db, ChainTail? tail)
    {
        var sequence = tail?.Sequence ?? 0;
        var previous = tail?.EntryHash ?? GenesisHash;
        foreach (var entry in db.ChangeTracker.Entries<AuditEntry>().Where(e => e.State == EntityState.Added).Select(e => e.Entity).ToList())
        {
            entry.Sequence = ++sequence;
            entry.At = Normalise(entry.At);
            entry.PreviousHash = previous;
            entry.EntryHash = HashEntry(entry);
            previous = entry.EntryHash;
        }
    }

    private sealed record ChainTail(long Sequence, string EntryHash);
}
