using System.Collections.Concurrent;
using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Scoring.Engine;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Traffic;

/// <summary>What the plan cache knows about a scorecard key.</summary>
public enum PlanState
{
    /// <summary>No scorecard has this key.</summary>
    NoScorecard,

    /// <summary>The scorecard exists but has no traffic plan yet.</summary>
    NoPlan,

    /// <summary>A plan is in force.</summary>
    Ready,
}

/// <summary>The answer of <see cref="PlanCache.GetAsync"/>.</summary>
public readonly record struct PlanLookup(PlanState State, ActivePlan? Plan);

/// <summary>
/// The plan in force per scorecard, compiled, in memory. Each entry is re-validated against the
/// database at most every <see cref="FreshnessInterval"/> (one indexed read of the newest revision
/// number), so a plan changed through any instance takes effect on every instance within about
/// half a second plus one query, and the hot path reads the database twice a second per
/// scorecard, not once per request.
/// </summary>
public sealed class PlanCache(VersionCache versions, TimeProvider clock)
{
    public static readonly TimeSpan FreshnessInterval = TimeSpan.FromMilliseconds(500);

    private readonly ConcurrentDictionary<string, Entry> _entries = new(StringComparer.Ordinal);

    public async ValueTask<PlanLookup> GetAsync(string key, LedgerlineDbContext db, CancellationToken ct)
    {
        if (_entries.TryGetValue(key, out var entry))
        {
            if (clock.GetElapsedTime(entry.CheckedAt) < FreshnessInterval
                || Interlocked.CompareExchange(ref entry.Refreshing, 1, 0) != 0)
            {
                // Fresh, or another request is re-validating it right now: serve what we have.
                return entry.Lookup;
            }

            try
            {
                var newest = await NewestRevisionAsync(db, entry.ScorecardId, ct);
                entry = newest == (entry.Lookup.Plan?.Revision ?? 0)
                    ? new Entry(entry.ScorecardId, entry.Lookup, clock.GetTimestamp())
                    : await LoadAsync(db, entry.ScorecardId, ct);
                _entries[key] = entry;
                return entry.Lookup;
            }
            finally
            {
                Volatile.Write(ref entry.Refreshing, 0);
            }
        }

        var scorecard = await db.Scorecards.AsNoTracking().Where(s => s.Key == key).Select(s => (long?)s.Id).FirstOrDefaultAsync(ct);
        if (scorecard is null)
        {
            return new PlanLookup(PlanState.NoScorecard, null);
        }

        entry = await LoadAsync(db, scorecard.Value, ct);
        _entries[key] = entry;
        return entry.Lookup;
    }

    /// <summary>Drops a scorecard's entry, so this instance sees its own plan change at once.</summary>
    public void Invalidate(string key) => _entries.TryRemove(key, out _);

    private static async Task<int> NewestRevisionAsync(LedgerlineDbContext db, long scorecardId, CancellationToken ct) =>
        await db.TrafficPlans.Where(p => p.ScorecardId == scorecardId).Select(p => (int?)p.Revision).MaxAsync(ct) ?? 0;

    private async Task<Entry> LoadAsync(LedgerlineDbContext db, long scorecardId, CancellationToken ct)
    {
        var checkedAt = clock.GetTimestamp();
        var plan = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecardId)
            .OrderByDescending(p => p.Revision).FirstOrDefaultAsync(ct);
        if (plan is null)
        {
            return new Entry(scorecardId, new PlanLookup(PlanState.NoPlan, null), checkedAt);
        }

        var challengers = plan.ChallengerShares();
        var shadows = plan.ShadowVersions();
        var numbers = challengers.Select(c => c.Version).Concat(shadows).Append(plan.ChampionVersion).ToList();
        var contents = await db.Versions.AsNoTracking()
            .Where(v => v.ScorecardId == scorecardId && numbers.Contains(v.Number))
            .ToDictionaryAsync(v => v.Number, v => v.Content, ct);
        PlanArm Arm(int version, ArmRole role, decimal share) =>
            new(version, role, share, versions.GetOrCompile(scorecardId, version, contents[version]));

        var arms = new List<PlanArm> { Arm(plan.ChampionVersion, ArmRole.Champion, 1m - challengers.Sum(c => c.Share)) };
        arms.AddRange(challengers.Select(c => Arm(c.Version, ArmRole.Challenger, c.Share)));
        arms.AddRange(shadows.Select(s => Arm(s, ArmRole.Shadow, 0m)));
        var active = new ActivePlan(scorecardId, plan.Revision, plan.Salt, arms);
        return new Entry(scorecardId, new PlanLookup(PlanState.Ready, active), checkedAt);
    }

    private sealed class Entry(long scorecardId, PlanLookup lookup, long checkedAt)
    {
        public int Refreshing;

        public long ScorecardId { get; } = scorecardId;

        public PlanLookup Lookup { get; } = lookup;

        public long CheckedAt { get; } = checkedAt;
    }
}
