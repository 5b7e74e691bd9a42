using Ledgerline.Api.Data;
using Ledgerline.Api.Ledger;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;
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
    public static async Task<List<ScoreCell>> ScoresAsync(LedgerlineDbContext db, long scorecardId, ReportQuery query, CancellationToken ct)
    {
        var scores = InRange(db.DecisionScores, scorecardId, query).Where(s => s.Score != null);
        if (query.Version is { } version)
        {
            scores = scores.Where(s => s.Version == version);
        }

        // Grouped by prefixes of the report indexes, in their order (plan revision included for
        // that reason only), then merged here.
        var cells = await SplitAsync(
            db,
            scores.GroupBy(s => new { s.Version, s.Deciding, s.Role, s.PlanRevision, s.Score, s.Band, s.DecisionBand })
                .Select(g => new IndexCell(g.Key.Version, g.Key.Deciding, g.Key.Role, g.Key.PlanRevision, g.Key.Score, g.Key.Band, g.Key.DecisionBand, null, 0, null, g.LongCount())),
            scores.Where(s => s.Matured)
                .GroupBy(s => new { s.Version, s.Deciding, s.Role, s.PlanRevision, s.Score, s.Band, s.DecisionBand, s.Outcome })
                .Select(g => new IndexCell(g.Key.Version, g.Key.Deciding, g.Key.Role, g.Key.PlanRevision, g.Key.Score, g.Key.Band, g.Key.DecisionBand, g.Key.Outcome, 0, null, g.LongCount())),
            c => (c.Version, c.Role, c.Deciding, Score: c.Score!.Value, c.Band, Approved: c.DecisionBand == Band.Approve),
            ct);
        return cells.Select(c => new ScoreCell(c.Key.Version, c.Key.Role, c.Key.Deciding, c.Key.Score, c.Key.Band, c.Key.Approved, c.Matured, c.Outcome, c.Count)).ToList();
    }

    /// <summary>The deciding arms: per deciding version, role and plan revision, the decision, its score and the outcome.</summary>
    public static async Task<List<ArmCell>> ArmsAsync(LedgerlineDbContext db, long scorecardId, ReportQuery query, CancellationToken ct)
    {
        var deciding = InRange(db.DecisionScores, scorecardId, query).Where(s => s.Deciding && s.Score != null);
        var cells = await SplitAsync(
            db,
            deciding.GroupBy(s => new { s.Version, s.Deciding, s.Role, s.PlanRevision, s.Score, s.Band, s.DecisionBand })
                .Select(g => new IndexCell(g.Key.Version, g.Key.Deciding, g.Key.Role, g.Key.PlanRevision, g.Key.Score, g.Key.Band, g.Key.DecisionBand, null, 0, null, g.LongCount())),
            deciding.Where(s => s.Matured)
                .GroupBy(s => new { s.Version, s.Deciding, s.Role, s.PlanRevision, s.Score, s.Band, s.DecisionBand, s.Outcome })
                .Select(g => new IndexCell(g.Key.Version, g.Key.Deciding, g.Key.Role, g.Key.PlanRevision, g.Key.Score, g.Key.Band, g.Key.DecisionBand, g.Key.Outcome, 0, null, g.LongCount())),
            c => (c.Version, c.Role, c.PlanRevision, Approved: c.DecisionBand == Band.Approve, Score: c.Score!.Value),
            ct);
        return cells.Select(c => new ArmCell(c.Key.Version, c.Key.Role, c.Key.PlanRevision, c.Key.Approved, c.Matured, c.Outcome, c.Key.Score, c.Count)).ToList();
    }

    /// <summary>
    /// Applications that version A scored while version B was the champion (and B scored too):
    /// counts per (score A, score B, approved by the decider, matured, outcome). Each row of A
    /// carries the champion's score of the same application, so no self-join is needed.
    /// </summary>
    public static async Task<List<PairCell>> PairsAsync(LedgerlineDbContext db, long scorecardId, int versionA, int championB, ReportQuery query, CancellationToken ct)
    {
        // The champion is picked here, not in SQL: an equality on a column in the middle of an
        // index makes SQLite sort the rows instead of streaming the groups.
        var scores = InRange(db.DecisionScores, scorecardId, query).Where(s => s.Version == versionA && s.Score != null && s.ChampionScore != null);
        var cells = await SplitAsync(
            db,
            scores.GroupBy(s => new { s.Deciding, s.Role, s.PlanRevision, s.Score, s.Band, s.DecisionBand, s.ChampionVersion, s.ChampionScore })
                .Select(g => new IndexCell(versionA, g.Key.Deciding, g.Key.Role, g.Key.PlanRevision, g.Key.Score, g.Key.Band, g.Key.DecisionBand, null, g.Key.ChampionVersion, g.Key.ChampionScore, g.LongCount())),
            scores.Where(s => s.Matured)
                .GroupBy(s => new { s.Deciding, s.Role, s.PlanRevision, s.Score, s.Band, s.DecisionBand, s.Outcome, s.ChampionVersion, s.ChampionScore })
                .Select(g => new IndexCell(versionA, g.Key.Deciding, g.Key.Role, g.Key.PlanRevision, g.Key.Score, g.Key.Band, g.Key.DecisionBand, g.Key.Outcome, g.Key.ChampionVersion, g.Key.ChampionScore, g.LongCount())),
            c => (Score: c.Score!.Value, ChampionScore: c.ChampionScore!.Value, Approved: c.DecisionBand == Band.Approve, c.ChampionVersion),
            ct);
        return cells.Where(c => c.Key.ChampionVersion == championB)
            .Select(c => new PairCell(c.Key.Score, c.Key.ChampionScore, c.Key.Approved, c.Matured, c.Outcome, c.Count)).ToList();
    }

    /// <summary>Decisions per application date, by whether the decider approved and where the outcome stands.</summary>
    public static Task<List<DecidedCell>> DecidedAsync(LedgerlineDbContext db, long scorecardId, ReportQuery query, CancellationToken ct) =>
        InRange(db.DecisionScores, scorecardId, query)
            .Where(s => s.Deciding)
            .GroupBy(s => new { s.ApplicationDate, Approved = s.DecisionBand == Band.Approve, s.Matured, s.Outcome })
            .Select(g => new DecidedCell(g.Key.ApplicationDate, g.Key.Approved, g.Key.Matured, g.Key.Outcome, g.LongCount()))
            .ToListAsync(ct);

    /// <summary>One version's scores per application date (for the population stability index).</summary>
    public static Task<List<DailyScoreCell>> DailyScoresAsync(LedgerlineDbContext db, long scorecardId, int version, ReportQuery query, CancellationToken ct) =>
        InRange(db.DecisionScores, scorecardId, query)
            .Where(s => s.Version == version && s.Score != null)
            .GroupBy(s => new { s.ApplicationDate, s.Score })
            .Select(g => new DailyScoreCell(g.Key.ApplicationDate, g.Key.Score!.Value, g.LongCount()))
            .ToListAsync(ct);

    /// <summary>
    /// One version's matched bins, one row per score in the range, streamed (for the characteristic
    /// stability indexes). No index holds the bins, so the table is read in its own order; grouping
    /// the bin strings in SQL sorted them all.
    /// </summary>
    public static IAsyncEnumerable<DailyBins> DailyBinsAsync(LedgerlineDbContext db, long scorecardId, int version, ReportQuery query)
    {
        return InRange(StoreDialect.Of(db).InStorageOrder<DecisionScore>(db), scorecardId, query)
            .Where(s => s.Version == version && s.MatchedBins != null)
            .Select(s => new DailyBins(s.ApplicationDate, s.MatchedBins!))
            .AsAsyncEnumerable();
    }

    /// <summary>
    /// Streams the cells of every score (grouped along the first report index) and the matured
    /// cells with their outcome (along the matured-only index) into one list, per report key:
    /// each matured outcome, and the rest as immature.
    /// </summary>
    private static async Task<List<(TKey Key, bool Matured, PerformanceClass? Outcome, long Count)>> SplitAsync<TKey>(
        LedgerlineDbContext db, IQueryable<IndexCell> all, IQueryable<IndexCell> matured, Func<IndexCell, TKey> keyOf, CancellationToken ct)
        where TKey : notnull
    {
        // One snapshot for both queries, so a decision that matures between them is not counted twice.
        await using var snapshot = await StoreDialect.Of(db).BeginReadSnapshotAsync(db, ct);
        var immature = new Dictionary<TKey, long>();
        await foreach (var cell in all.AsAsyncEnumerable().WithCancellation(ct))
        {
            var key = keyOf(cell);
            immature[key] = immature.GetValueOrDefault(key) + cell.Count;
        }

        var outcomes = new Dictionary<(TKey Key, PerformanceClass? Outcome), long>();
        await foreach (var cell in matured.AsAsyncEnumerable().WithCancellation(ct))
        {
            var key = keyOf(cell);
            outcomes[(key, cell.Outcome)] = outcomes.GetValueOrDefault((key, cell.Outcome)) + cell.Count;
            immature[key] = immature.GetValueOrDefault(key) - cell.Count;
        }

        var cells = new List<(TKey Key, bool Matured, PerformanceClass? Outcome, long Count)>(outcomes.Count + immature.Count);
        cells.AddRange(outcomes.Select(o => (o.Key.Key, true, o.Key.Outcome, o.Value)));
        cells.AddRange(immature.Where(i => i.Value > 0).Select(i => (i.Key, false, (PerformanceClass?)null, i.Value)));
        return cells;
    }

    /// <summary>One group read from a report index; columns a query does not group by hold defaults.</summary>
    private sealed record IndexCell(
        int Version, bool Deciding, ArmRole Role, int PlanRevision, decimal? Score, Band? Band, Band DecisionBand,
        PerformanceClass? Outcome, int ChampionVersion, decimal? ChampionScore, long Count);

    private static IQueryable<DecisionScore> InRange(IQueryable<DecisionScore> table, long scorecardId, ReportQuery query)
    {
        var scores = table.AsNoTracking().Where(s => s.ScorecardId == scorecardId);
        if (query.From is { } from)
        {
            scores = scores.Where(s => s.ApplicationDate >= from);
        }

        if (query.To is { } to)
        {
            scores = scores.Where(s => s.ApplicationDate <= to);
        }

        return scores;
    }
}

/// <summary>Applications one version scored with one score, by role and by what happened to them.</summary>
public sealed record ScoreCell(int Version, ArmRole Role, bool Deciding, decimal Score, Band? Band, bool Approved, bool Matured, PerformanceClass? Outcome, long Count)
{
    /// <summary>True when the cell counts towards performance figures: approved by the decider, matured, good or bad.</summary>
    public bool InPerformance => Approved && Matured && Outcome is PerformanceClass.Good or PerformanceClass.Bad;
}

/// <summary>Decisions of one deciding arm with one score and outcome.</summary>
public sealed record ArmCell(int Version, ArmRole Role, int PlanRevision, bool Approved, bool Matured, PerformanceClass? Outcome, decimal Score, long Count)
{
    public bool InPerformance => Approved && Matured && Outcome is PerformanceClass.Good or PerformanceClass.Bad;
}

/// <summary>Applications scored by both versions of a pair, per score pair and outcome.</summary>
public sealed record PairCell(decimal ScoreA, decimal ScoreB, bool Approved, bool Matured, PerformanceClass? Outcome, long Count)
{
    public bool InPerformance => Approved && Matured && Outcome is PerformanceClass.Good or PerformanceClass.Bad;
}

/// <summary>Decisions of one application date by what the decider answered and where the outcome stands.</summary>
public sealed record DecidedCell(DateOnly Date, bool Approved, bool Matured, PerformanceClass? Outcome, long Count);

/// <summary>Applications of one date with one score.</summary>
public sealed record DailyScoreCell(DateOnly Date, decimal Score, long Count);

/// <summary>One score's application date and matched bins.</summary>
public sealed record DailyBins(DateOnly Date, string MatchedBins);
