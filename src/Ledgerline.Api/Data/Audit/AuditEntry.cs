namespace Ledgerline.Api.Data.Audit;

/// <summary>
/// One appended record of a state change: who, when, what, and the SHA-256 of the changed
/// content. Entries form a hash chain: each carries the hash of the one before, so editing,
/// inserting or deleting a row breaks every link after it.
/// </summary>
public sealed class AuditEntry
{
    public long Id { get; set; }

    /// <summary>Position in the chain: 1, 2, 3… without gaps; unique, so two writers can never fork the chain.</summary>
    public long Sequence { get; set; }

    /// <summary>
    /// UTC, whole microseconds (the finest both stores keep), so the hash replays on either. A
    /// UTC <see cref="DateTime"/> rather than an offset: SQLite can then compare it in SQL.
    /// </summary>
    public DateTime At { get; set; }

    public required string Actor { get; set; }

    /// <summary>What happened, e.g. <c>version.registered</c>, <c>traffic.changed</c>.</summary>
    public required string Action { get; set; }

    /// <summary>What it happened to, e.g. <c>personal-loan-application/versions/2</c>.</summary>
    public required string Subject { get; set; }

    /// <summary>Hex SHA-256 of the changed content as JSON.</summary>
    public required string ContentHash { get; set; }

    /// <summary>The <see cref="EntryHash"/> of the entry before; 64 zeros for the first.</summary>
    public string PreviousHash { get; set; } = string.Empty;

    /// <summary>Hex SHA-256 of this entry's canonical form (see <see cref="AuditChain.HashEntry"/>).</summary>
    public string EntryHash { get; set; } = string.Empty;
}
