namespace Ledgerline.Api.Features.Audit;

/// <summary>One audit entry as read.</summary>
/// <param name="Id">The entry's position in the chain: 1, 2, 3…</param>
/// <param name="At">When the change happened (UTC).</param>
/// <param name="Actor">The id of the key that made the change, or <c>configuration</c> for the bootstrap admin key.</param>
/// <param name="Action">What happened, e.g. <c>version.approved</c>.</param>
/// <param name="Subject">What it happened to, e.g. <c>personal-loan-application/versions/2</c>.</param>
/// <param name="ContentHash">Hex SHA-256 of the changed content as JSON.</param>
/// <param name="PreviousHash">The entry hash of the entry before (64 zeros for the first).</param>
/// <param name="EntryHash">Hex SHA-256 of this entry's canonical form.</param>
public sealed record AuditEntryResponse(
    long Id, DateTimeOffset At, string Actor, string Action, string Subject, string ContentHash, string PreviousHash, string EntryHash);

/// <summary>A page of entries, oldest first.</summary>
/// <param name="Entries">The entries.</param>
/// <param name="Next">Pass as <c>after</c> for the next page; absent on the last page.</param>
public sealed record AuditPageResponse(IReadOnlyList<AuditEntryResponse> Entries, long? Next);

/// <summary>The outcome of walking the whole chain.</summary>
/// <param name="Verified">True when every entry's hash matches its content and links to the entry before.</param>
/// <param name="Entries">How many entries were checked (all of them when verified).</param>
/// <param name="BrokenAt">The id of the first entry that fails.</param>
/// <param name="Reason">Why that entry fails.</param>
/// <param name="LastHash">The hash of the newest entry: keep it elsewhere to detect later removal of entries at the end.</param>
public sealed record AuditVerificationResponse(bool Verified, long Entries, long? BrokenAt, string? Reason, string? LastHash);
