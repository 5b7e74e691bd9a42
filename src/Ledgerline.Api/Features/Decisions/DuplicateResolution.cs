using Ledgerline.Api.Data;
using Ledgerline.Api.Ledger;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>
/// What to answer when the log already held a decision with the same idempotency key or
/// application id: the original decision when the body is the same, a conflict saying why otherwise.
/// </summary>
public static class DuplicateResolution
{
    public static async Task<(DecisionResponse? Replay, string? Conflict)> ResolveAsync(LedgerlineDbContext db, Decision attempted, DecisionResponse attemptedAnswer, CancellationToken ct)
    {
        var byKey = await db.Decisions.AsNoTracking()
            .FirstOrDefaultAsync(d => d.ScorecardId == attempted.ScorecardId && d.IdempotencyKey == attempted.IdempotencyKey, ct);
        if (byKey is not null && !(byKey.ApplicationId == attempted.ApplicationId && attempted.IdempotencyKey == attempted.ApplicationId))
        {
            return byKey.RequestHash == attempted.RequestHash
                ? (Replay(byKey, attemptedAnswer), null)
                : (null, $"Idempotency key '{attempted.IdempotencyKey}' was used before (application '{byKey.ApplicationId}', decided {byKey.DecidedAt:u}) with a different body; "
                    + "resend the original body to read that decision, or use a new key for a new request.");
        }

        var byApplication = byKey ?? await db.Decisions.AsNoTracking()
            .FirstOrDefaultAsync(d => d.ScorecardId == attempted.ScorecardId && d.ApplicationId == attempted.ApplicationId, ct);
        if (byApplication is not null)
        {
            return byApplication.RequestHash == attempted.RequestHash
                ? (Replay(byApplication, attemptedAnswer), null)
                : (null, $"Application '{attempted.ApplicationId}' was decided before (decision {byApplication.Id}, {byApplication.DecidedAt:u}) with a different body; "
                    + "a logged decision is never replaced. GET the decision to read it, or send a new application id.");
        }

        return (null, "A concurrent request for the same application or idempotency key has not finished; retry in a moment.");
    }

    // The same body scored by the same version matches the same bins, so the original answer
    // carries the unmatched values this attempt found.
    private static DecisionResponse Replay(Decision original, DecisionResponse attemptedAnswer)
    {
        var answer = DecisionMaker.ToResponse(original);
        return original.Version == attemptedAnswer.Version ? answer with { Unmatched = attemptedAnswer.Unmatched } : answer;
    }
}
