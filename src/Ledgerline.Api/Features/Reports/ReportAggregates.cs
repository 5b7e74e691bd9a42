using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Decisions;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Reports;

/// <summary>
/// The aggregation queries behind the reports. Every one groups in the database (by version,
/// score, outcome, bin or date), so the service reads counts whose number grows with distinct
/// scores and bins, never with the number of decisions.
/// </summary>
public static class ReportAggregates
{
    /// <summary>Scores of every version, with what the deciding version did and how the application turned out.</summary>
    public static Task<List<ScoreCell>> ScoresAsync(LedgerlineDbContext db, long scorecardId, ReportQuery query, CancellationToken ct)
    {
        var scores = db.DecisionScores.Where(s => s.ScorecardId == scorecardId && s.Score != null);
        if (query.Version is { } version)
        {
            scores = scores.Where(s => s.Version == version);
        }

        return (from s in scores
                join d in InRange(db, scorecardId, query) on s.DecisionId equals d.Id
                group s by new { s.Version, s.Role, s.Deciding, s.Score, s.Band, Approved = d.Band == ApproveWord, d.Matured, d.Outcome } into g
                select new ScoreCell(g.Key.Version, g.Key.Role, g.Key.Deciding, g.Key.Score!.Value, g.Key.Band, g.Key.Approved, g.Key.Matured, g.Key.Outcome, g.Count()))
            .ToListAsync(ct);
    }

    /// <summary>The deciding arms: per deciding version, role and plan revision, the decision, its score and the outcome.</summary>
    public static Task<List<ArmCell>> ArmsAsync(LedgerlineDbContext db, long scorecardId, ReportQuery query, CancellationToken ct) =>
        (from d in InRange(db, scorecardId, query)
         group d by new { d.Version, d.Role, d.PlanRevision, Approved = d.Band == ApproveWord, d.Matured, d.Outcome, d.Score } into g
         select new ArmCell(g.Key.Version, g.Key.Role, g.Key.PlanRevision, g.Key.Approved, g.Key.Matured, g.Key.Outcome, g.Key.Score, g.Count()))
        .ToListAsync(ct);

    /// <summary>
    /// Applications scored by both versions: counts per (score A, score B, approved by the decider,
    /// matured, outcome), from a self-join of the scores on the decision.
    /// </summary>
    public static Task<List<PairCell>> PairsAsync(LedgerlineDbContext db, long scorecardId, int versionA, int versionB, ReportQuery query, CancellationToken ct) =>
        (from a in db.DecisionScores
         join b in db.DecisionScores on a.DecisionId equals b.DecisionId
         join d in InRange(db, scorecardId, query) on a.DecisionId equals d.Id
         where a.ScorecardId == scorecardId && a.Version == versionA && a.Score != null && b.Version == versionB && b.Score != null
         group a by new { ScoreA = a.Score, ScoreB = b.Score, Approved = d.Band == ApproveWord, d.Matured, d.Outcome } into g
         select new PairCell(g.Key.ScoreA!.Value, g.Key.ScoreB!.Value, g.Key.Approved, g.Key.Matured, g.Key.Outcome, g.Count()))
        .ToListAsync(ct);

    /// <summary>One version's scores per application date (for the population stability index).</summary>
    public static Task<List<DailyScoreCell>> DailyScoresAsync(LedgerlineDbContext db, long scorecardId, int version, ReportQuery query, CancellationToken ct) =>
        (from s in db.DecisionScores
         join d in InRange(db, scorecardId, query) on s.DecisionId equals d.Id
         where s.ScorecardId == scorecardId && s.Version == version && s.Score != null
         group s by new { d.ApplicationDate, s.Score } into g
         select new DailyScoreCell(g.Key.ApplicationDate, g.Key.Score!.Value, g.Count()))
        .ToListAsync(ct);

    /// <summary>One version's matched bins per application date (for the characteristic stability indexes).</summary>
    public static Task<List<DailyBinsCell>> DailyBinsAsync(LedgerlineDbContext db, long scorecardId, int version, ReportQuery query, CancellationToken ct) =>
        (from s in db.DecisionScores
         join d in InRange(db, scorecardId, query) on s.DecisionId equals d.Id
         where s.ScorecardId == scorecardId && s.Version == version && s.MatchedBins != null
         group s by new { d.ApplicationDate, s.MatchedBins } into g
         select new DailyBinsCell(g.Key.ApplicationDate, g.Key.MatchedBins!, g.Count()))
        .ToListAsync(ct);

    private const string ApproveWord = "approve";

    private static IQueryable<Decision> InRange(LedgerlineDbContext db, long scorecardId, ReportQuery query)
    {
        var decisions = db.Decisions.Where(d => d.ScorecardId == scorecardId);
        if (query.From is { } from)
        {
            decisions = decisions.Where(d => d.ApplicationDate >= from);
        }

        if (query.To is { } to)
        {
            decisions = decisions.Where(d => d.ApplicationDate <= to);
        }

        return decisions;
    }
}

/// <summary>Applications one version scored with one score, by role and by what happened to them.</summary>
public sealed record ScoreCell(int Version, ArmRole Role, bool Deciding, decimal Score, string? Band, bool Approved, bool Matured, OutcomeClass? Outcome, long Count)
{
    /// <summary>True when the cell counts towards performance figures: approved by the decider, matured, good or bad.</summary>
    public bool InPerformance => Approved && Matured && Outcome is OutcomeClass.Good or OutcomeClass.Bad;
}

/// <summary>Decisions of one deciding arm with one score and outcome.</summary>
public sealed record ArmCell(int Version, ArmRole Role, int PlanRevision, bool Approved, bool Matured, OutcomeClass? Outcome, decimal Score, long Count)
{
    public bool InPerformance => Approved && Matured && Outcome is OutcomeClass.Good or OutcomeClass.Bad;
}

/// <summary>Applications scored by both versions of a pair, per score pair and outcome.</summary>
public sealed record PairCell(decimal ScoreA, decimal ScoreB, bool Approved, bool Matured, OutcomeClass? Outcome, long Count)
{
    public bool InPerformance => Approved && Matured && Outcome is OutcomeClass.Good or OutcomeClass.Bad;
}

/// <summary>Applications of one date with one score.</summary>
public sealed record DailyScoreCell(DateOnly Date, decimal Score, long Count);

/// <summary>Applications of one date with one combination of matched bins.</summary>
public sealed record DailyBinsCell(DateOnly Date, string MatchedBins, long Count);
