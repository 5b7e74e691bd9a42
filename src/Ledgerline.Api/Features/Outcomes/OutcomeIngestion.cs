using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Ledger;
using Ledgerline.Scoring.Outcomes;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>
/// Checks and stores one chunk of rows at a time: one query finds the chunk's decisions, one
/// loads their earlier readings, then each good row is inserted and each touched decision's
/// current outcome recomputed from all its readings. A row is stored whole or not at all.
/// </summary>
internal sealed class OutcomeIngestion(
    LedgerlineDbContext db,
    OutcomeStore store,
    Scorecard scorecard,
    IReadOnlyDictionary<long, string> otherScorecards,
    bool atomic,
    DateOnly today,
    DateTimeOffset now)
{
    private readonly OutcomeDefinitionRule _rule = new(scorecard.BadDaysPastDue, scorecard.IndeterminateDaysPastDue, scorecard.PerformanceWindowMonths);

    public int Accepted { get; private set; }

    public List<RejectedOutcome> Rejected { get; } = [];

    public async Task ProcessAsync(List<OutcomeRow> rows, CancellationToken ct)
    {
        var ids = rows.Where(r => r.Error is null).Select(r => r.ApplicationId!).Distinct().ToList();
        var decisions = await db.Decisions.AsNoTracking()
            .Where(d => d.ScorecardId == scorecard.Id && ids.Contains(d.ApplicationId))
            .Select(d => new DecisionRef(d.Id, d.ApplicationId, d.ApplicationDate, d.Outcome != null))
            .ToDictionaryAsync(d => d.ApplicationId, StringComparer.Ordinal, ct);
        var elsewhere = await FindElsewhereAsync(ids.Where(i => !decisions.ContainsKey(i)).ToList(), ct);

        var good = new List<(DecisionRef Decision, OutcomeReading Reading)>(rows.Count);
        foreach (var row in rows)
        {
            var problem = row.Error;
            DecisionRef? decision = null;
            var reading = default(OutcomeReading);
            if (problem is null && !decisions.TryGetValue(row.ApplicationId!, out decision))
            {
                problem = elsewhere.TryGetValue(row.ApplicationId!, out var other)
                    ? $"Application '{row.ApplicationId}' was decided under scorecard '{other}', not '{scorecard.Key}'; post its outcome to /scorecards/{other}/outcomes."
                    : $"No decision for application '{row.ApplicationId}' under scorecard '{scorecard.Key}'; outcomes join decisions by application id.";
            }

            if (problem is null)
            {
                reading = new OutcomeReading(row.ObservedAt!.Value, row.WorstDaysPastDue, row.ChargedOff, row.Status);
                problem = OutcomeReadingCheck.Check(_rule, reading, decision!.ApplicationDate, today);
            }

            if (problem is not null)
            {
                Rejected.Add(new RejectedOutcome(row.Index, row.ApplicationId, problem));
            }
            else
            {
                good.Add((decision!, reading));
            }
        }

        // With atomic=true, one bad row means nothing will be committed: keep checking, stop writing.
        if (atomic && Rejected.Count > 0)
        {
            return;
        }

        await StoreAsync(good, ct);
        Accepted += good.Count;
    }

    private async Task StoreAsync(List<(DecisionRef Decision, OutcomeReading Reading)> good, CancellationToken ct)
    {
        var touched = good.Select(g => g.Decision.Id).Distinct().ToList();
        if (touched.Count == 0)
        {
            return;
        }

        // Another instance may post for the same accounts: lock the decisions so each
        // recomputation sees every reading committed before it.
        await StoreDialect.Of(db).LockRowsAsync<Decision>(db, touched, ct);

        // Only decisions that already have an outcome have earlier readings to load.
        var readings = new Dictionary<Guid, List<OutcomeReading>>(touched.Count);
        var withReadings = good.Where(g => g.Decision.HasReadings).Select(g => g.Decision.Id).Distinct().ToList();
        var earlier = withReadings.Count == 0 ? [] : await db.Outcomes.AsNoTracking()
            .Where(o => withReadings.Contains(o.DecisionId))
            .OrderBy(o => o.Id)
            .Select(o => new { o.DecisionId, o.ObservedAt, o.WorstDaysPastDue, o.ChargedOff, o.Status })
            .ToListAsync(ct);
        foreach (var o in earlier)
        {
            ReadingsOf(readings, o.DecisionId).Add(new OutcomeReading(o.ObservedAt, o.WorstDaysPastDue, o.ChargedOff, o.Status));
        }

        var applicationDates = new Dictionary<Guid, DateOnly>(touched.Count);
        var observations = new List<OutcomeObservation>(good.Count);
        foreach (var (decision, reading) in good)
        {
            observations.Add(new OutcomeObservation
            {
                DecisionId = decision.Id,
                ObservedAt = reading.ObservedAt,
                WorstDaysPastDue = reading.WorstDaysPastDue,
                ChargedOff = reading.ChargedOff,
                Status = reading.Status,
                Classified = _rule.Classify(reading),
                ReceivedAt = now,
            });
            ReadingsOf(readings, decision.Id).Add(reading);
            applicationDates[decision.Id] = decision.ApplicationDate;
        }

        await store.InsertAllAsync(observations, ct);
        // In key order: decisions and their scores lie in the tables roughly in that order, so
        // neighbouring updates share pages.
        foreach (var (id, applicationDate) in applicationDates.OrderBy(a => a.Key))
        {
            var current = OutcomeClassifier.Classify(_rule, applicationDate, readings[id])!.Value;
            await store.UpdateDecisionAsync(id, current.Class, current.Matured, current.ObservedAt, ct);
        }
    }

    /// <summary>Which other scorecard (of those the caller may use) decided each unknown application id.</summary>
    private async Task<Dictionary<string, string>> FindElsewhereAsync(List<string> misses, CancellationToken ct)
    {
        if (misses.Count == 0 || otherScorecards.Count == 0)
        {
            return [];
        }

        var scorecardIds = otherScorecards.Keys.ToList();
        var found = await db.Decisions.AsNoTracking()
            .Where(d => scorecardIds.Contains(d.ScorecardId) && misses.Contains(d.ApplicationId))
            .Select(d => new { d.ApplicationId, d.ScorecardId })
            .ToListAsync(ct);
        return found.GroupBy(f => f.ApplicationId, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => otherScorecards[g.First().ScorecardId], StringComparer.Ordinal);
    }

    private static List<OutcomeReading> ReadingsOf(Dictionary<Guid, List<OutcomeReading>> readings, Guid id)
    {
        if (!readings.TryGetValue(id, out var list))
        {
            list = [];
            readings[id] = list;
        }

        return list;
    }

    private sealed record DecisionRef(Guid Id, string ApplicationId, DateOnly ApplicationDate, bool HasReadings);
}
