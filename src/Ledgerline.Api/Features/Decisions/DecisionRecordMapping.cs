using System.Text.Json;
using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Ledger;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>Builds the full record of a logged decision; points follow from matched bins and the immutable versions.</summary>
public static class DecisionRecordMapping
{
    public static async Task<DecisionRecordResponse> ToRecordAsync(
        LedgerlineDbContext db, VersionCache versions, Decision d, IReadOnlyList<OutcomeObservation> observations, CancellationToken ct)
    {
        var compiled = new Dictionary<int, CompiledScorecard>();
        var missing = d.Scores.Select(s => s.Version).Distinct().Where(v =>
        {
            if (versions.TryGet(d.ScorecardId, v, out var found))
            {
                compiled[v] = found!;
                return false;
            }

            return true;
        }).ToList();
        if (missing.Count > 0)
        {
            var contents = await db.Versions.AsNoTracking().Where(v => v.ScorecardId == d.ScorecardId && missing.Contains(v.Number))
                .Select(v => new { v.Number, v.Content }).ToListAsync(ct);
            foreach (var v in contents)
            {
                compiled[v.Number] = versions.GetOrCompile(d.ScorecardId, v.Number, v.Content);
            }
        }

        var deciding = d.Scores.FirstOrDefault(s => s.Deciding);
        var others = d.Scores.Where(s => !s.Deciding).OrderBy(s => s.Role).ThenBy(s => s.Version).Select(s => new VersionScoreResponse(
            s.Version,
            s.Role,
            s.Score is { } score ? CanonicalNumber.Normalize(score) : null,
            s.ProbabilityOfBad,
            s.Band,
            Characteristics(compiled, s),
            s.Error)).ToList();
        DecisionOutcomeResponse? outcome = d.Outcome is null && observations.Count == 0
            ? null
            : new DecisionOutcomeResponse(
                d.Outcome,
                d.Matured,
                d.OutcomeObservedAt,
                observations.Select(o => new OutcomeObservationResponse(o.ObservedAt, o.WorstDaysPastDue, o.ChargedOff, o.Status, o.Classified, o.ReceivedAt)).ToList());
        return new DecisionRecordResponse(
            d.Id,
            d.ApplicationId,
            d.IdempotencyKey,
            d.AssignmentKey,
            d.ApplicationDate,
            d.DecidedAt,
            d.PlanRevision,
            d.Version,
            d.Role,
            CanonicalNumber.Normalize(d.Score),
            d.ProbabilityOfBad,
            d.Band,
            JsonSerializer.Deserialize<List<Scorecards.ReasonCodeResponse>>(d.ReasonCodes, JsonSerializerOptions.Web) ?? [],
            deciding is null ? [] : Characteristics(compiled, deciding) ?? [],
            others,
            outcome);
    }

    private static IReadOnlyList<CharacteristicScore>? Characteristics(Dictionary<int, CompiledScorecard> compiled, DecisionScore s) =>
        s.MatchedBins is null || !compiled.TryGetValue(s.Version, out var version)
            ? null
            : ScoreMapping.Characteristics(version, s.MatchedBins.Length == 0 ? [] : s.MatchedBins.Split(',').Select(int.Parse).ToArray());
}
