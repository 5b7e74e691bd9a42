using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Audit;

public static class AuditEndpoints
{
    public const int DefaultPageSize = 100;
    public const int MaxPageSize = 1000;

    /// <summary>Entries read per round trip while verifying: memory stays flat however long the chain.</summary>
    private const int VerifyBatch = 2000;

    public static IEndpointRouteBuilder MapAudit(this IEndpointRouteBuilder routes)
    {
        // Administrators and risk managers read the trail and check it; nobody writes it through HTTP.
        var group = routes.MapGroup("/audit").WithTags("Audit").AllowRoles(Roles.Admin, Roles.Risk);
        group.MapGet("/", ListAuditEntries);
        group.MapGet("/verify", VerifyAuditChain);
        return routes;
    }

    /// <summary>Entries oldest first, filtered; <paramref name="subject"/> matches the subject and everything under it.</summary>
    public static async Task<Results<Ok<AuditPageResponse>, ValidationProblem>> ListAuditEntries(
        LedgerlineDbContext db,
        CancellationToken ct,
        string? actor = null,
        string? action = null,
        string? subject = null,
        DateTimeOffset? from = null,
        DateTimeOffset? to = null,
        long? after = null,
        int? limit = null)
    {
        var size = limit ?? DefaultPageSize;
        if (size is < 1 or > MaxPageSize)
        {
            return Problems.Invalid("limit", $"must be between 1 and {MaxPageSize}; page on with 'after'");
        }

        if (from > to)
        {
            return Problems.Invalid("from", "must not be later than 'to'");
        }

        var query = db.AuditEntries.AsNoTracking();
        if (!string.IsNullOrEmpty(actor))
        {
            query = query.Where(e => e.Actor == actor);
        }

        if (!string.IsNullOrEmpty(action))
        {
            query = query.Where(e => e.Action == action);
        }

        if (!string.IsNullOrEmpty(subject))
        {
            var under = subject + "/";
            query = query.Where(e => e.Subject == subject || e.Subject.StartsWith(under));
        }

        if (from is { } start)
        {
            var utc = AuditChain.Normalise(start.UtcDateTime);
            query = query.Where(e => e.At >= utc);
        }

        if (to is { } end)
        {
            var utc = AuditChain.Normalise(end.UtcDateTime);
            query = query.Where(e => e.At < utc);
        }

        if (after is { } last)
        {
            query = query.Where(e => e.Sequence > last);
        }

        var page = await query.OrderBy(e => e.Sequence).Take(size + 1).ToListAsync(ct);
        var more = page.Count > size;
        var entries = page.Take(size).Select(ToResponse).ToList();
        return TypedResults.Ok(new AuditPageResponse(entries, more ? entries[^1].Id : null));
    }

    /// <summary>Walks the whole chain: every hash must match its entry and link to the entry before, without gaps.</summary>
    public static async Task<Ok<AuditVerificationResponse>> VerifyAuditChain(LedgerlineDbContext db, CancellationToken ct)
    {
        var expected = 1L;
        var previous = AuditChain.GenesisHash;
        while (true)
        {
            var batch = await db.AuditEntries.AsNoTracking().Where(e => e.Sequence >= expected)
                .OrderBy(e => e.Sequence).Take(VerifyBatch).ToListAsync(ct);
            foreach (var entry in batch)
            {
                var reason = entry.Sequence != expected
                    ? $"entry {expected} is missing: the chain jumps from {expected - 1} to {entry.Sequence}"
                    : entry.PreviousHash != previous
                        ? $"entry {entry.Sequence} does not link to entry {expected - 1}: its previous hash differs from that entry's hash (an entry was altered, inserted or removed)"
                        : AuditChain.HashEntry(entry) != entry.EntryHash
                            ? $"entry {entry.Sequence} does not match its hash: its actor, action, subject, time or content hash was altered"
                            : null;
                if (reason is not null)
                {
                    return TypedResults.Ok(new AuditVerificationResponse(false, expected - 1, entry.Sequence, reason, null));
                }

                previous = entry.EntryHash;
                expected++;
            }

            if (batch.Count < VerifyBatch)
            {
                return TypedResults.Ok(new AuditVerificationResponse(true, expected - 1, null, null, previous));
            }
        }
    }

    private static AuditEntryResponse ToResponse(AuditEntry e) =>
        new(e.Sequence, new DateTimeOffset(DateTime.SpecifyKind(e.At, DateTimeKind.Utc)), e.Actor, e.Action, e.Subject, e.ContentHash, e.PreviousHash, e.EntryHash);
}
