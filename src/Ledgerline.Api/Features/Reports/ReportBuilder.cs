using System.Globalization;
using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Reports;

/// <summary>Builds the three reports from database aggregates; the endpoints and the alert job share it.</summary>
public sealed class ReportBuilder(LedgerlineDbContext db, VersionCache cache)
{
    /// <summary>Every version of the scorecard, compiled, with its parsed baseline.</summary>
    public async Task<Dictionary<int, ReportVersion>> VersionsAsync(Scorecard scorecard, CancellationToken ct)
    {
        var versions = await db.Versions.AsNoTracking().Include(v => v.Baseline).Where(v => v.ScorecardId == scorecard.Id).ToListAsync(ct);
        return versions.ToDictionary(v => v.Number, v => new ReportVersion(
            v.Number,
            cache.GetOrCompile(scorecard.Id, v.Number, v.Content),
            v.Baseline is { } b ? BaselineEndpoints.Parse(b.Aggregates) : null));
    }

    public async Task<MonitoringThresholds> ThresholdsAsync(long scorecardId, CancellationToken ct) =>
        await db.MonitoringThresholds.AsNoTracking().FirstOrDefaultAsync(t => t.ScorecardId == scorecardId, ct) ?? MonitoringThresholds.Defaults(scorecardId);

    public async Task<PerformanceReport> PerformanceAsync(Scorecard scorecard, IReadOnlyDictionary<int, ReportVersion> versions, ReportQuery query, CancellationToken ct)
    {
        var cells = await ReportAggregates.ScoresAsync(db, scorecard.Id, query, ct);
        var byVersion = cells.GroupBy(c => c.Version).ToDictionary(g => g.Key, g => (IReadOnlyList<ScoreCell>)g.ToList());
        var numbers = query.Version is { } only ? [only] : byVersion.Keys.Order().ToList();
        var reports = numbers.Select(n => PerformanceCalculator.Compute(n, versions[n].Compiled, versions[n].Baseline,
            byVersion.GetValueOrDefault(n) ?? [], query.RangeText)).ToList();
        return new PerformanceReport(scorecard.Key, query.RangeText, reports);
    }

    public async Task<ComparisonReport> ComparisonAsync(Scorecard scorecard, IReadOnlyDictionary<int, ReportVersion> versions, ReportQuery query, CancellationToken ct)
    {
        var arms = await ReportAggregates.ArmsAsync(db, scorecard.Id, query with { Version = null }, ct);
        var revisionNumbers = arms.Select(a => a.PlanRevision).Distinct().ToList();
        var revisions = await db.TrafficPlans.AsNoTracking()
            .Where(p => p.ScorecardId == scorecard.Id && revisionNumbers.Contains(p.Revision)).ToListAsync(ct);

        int champion;
        List<int> challengers;
        if (arms.Count > 0)
        {
            champion = arms.Where(a => a.Role == ArmRole.Champion).OrderByDescending(a => a.PlanRevision).Select(a => a.Version).FirstOrDefault();
            challengers = arms.Where(a => a.Role == ArmRole.Challenger && a.Version != champion).Select(a => a.Version).Distinct().Order().ToList();
        }
        else
        {
            var latest = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecard.Id).OrderByDescending(p => p.Revision).FirstOrDefaultAsync(ct);
            if (latest is null)
            {
                return new ComparisonReport(scorecard.Key, query.RangeText, null, [], [],
                    "No decisions in the range and no traffic plan: there is nothing to compare. Set a plan with PUT /scorecards/{key}/traffic.");
            }

            champion = latest.ChampionVersion;
            challengers = latest.ChallengerShares().Select(c => c.Version).ToList();
        }

        if (query.Version is { } requested && requested != champion)
        {
            challengers = [requested];
        }

        var comparisons = new List<ChallengerComparison>();
        ComparedVersion? championFigures = null;
        var championArm = ComparisonCalculator.Arm(champion, ArmRole.Champion, arms, query.RangeText);
        foreach (var challenger in challengers)
        {
            var pairs = await ReportAggregates.PairsAsync(db, scorecard.Id, challenger, champion, query with { Version = null }, ct);
            var comparison = ComparisonCalculator.Compare(champion, versions[champion].Compiled, challenger, versions[challenger].Compiled, pairs, arms, query.RangeText);
            championFigures ??= ComparisonCalculator.Figures(champion, ComparisonCalculator.Marginals(pairs).Champion, championArm,
                ComparisonCalculator.PairedPopulation(champion, challenger, query.RangeText));
            comparisons.Add(comparison);
        }

        if (championFigures is null)
        {
            var cells = await ReportAggregates.ScoresAsync(db, scorecard.Id, query with { Version = champion }, ct);
            championFigures = ComparisonCalculator.Figures(champion,
                PerformanceCalculator.Histogram(cells.Where(c => c.InPerformance).Select(c => (c.Score, c.Outcome, c.Count))),
                championArm, PerformanceCalculator.PopulationText(champion, query.RangeText));
        }

        return new ComparisonReport(scorecard.Key, query.RangeText, championFigures, comparisons, ComparisonCalculator.SampleRatio(arms, revisions),
            challengers.Count == 0 ? "The champion had no challenger in the range." : null);
    }

    /// <summary>Decisions per application month by where their outcome stands.</summary>
    public async Task<List<CohortMaturity>> CohortsAsync(Scorecard scorecard, ReportQuery query, CancellationToken ct)
    {
        var days = await ReportAggregates.DecidedAsync(db, scorecard.Id, query, ct);
        return days.GroupBy(d => d.Date.ToString("yyyy-MM", CultureInfo.InvariantCulture)).OrderBy(g => g.Key, StringComparer.Ordinal)
            .Select(g => new CohortMaturity(
                g.Key,
                g.Where(d => !d.Approved).Sum(d => d.Count),
                g.Where(d => d.Approved && d.Matured && d.Outcome == PerformanceClass.Good).Sum(d => d.Count),
                g.Where(d => d.Approved && d.Matured && d.Outcome == PerformanceClass.Bad).Sum(d => d.Count),
                g.Where(d => d.Approved && d.Matured && d.Outcome == PerformanceClass.Indeterminate).Sum(d => d.Count),
                g.Where(d => d.Approved && !d.Matured).Sum(d => d.Count)))
            .ToList();
    }

    public async Task<StabilityReport> StabilityAsync(Scorecard scorecard, ReportVersion version, ReportQuery query, CancellationToken ct)
    {
        var thresholds = await ThresholdsAsync(scorecard.Id, ct);
        var figure = new StabilityThresholdsFigure(thresholds.PsiAmber, thresholds.PsiRed, thresholds.CsiAmber, thresholds.CsiRed);
        var period = query.Period == ReportPeriod.Month ? "month" : "week";
        var population = $"every application scored by version {version.Number} (deciding or not, any decision, matured or not), against its development sample; {query.RangeText}";
        if (version.Baseline is null)
        {
            return new StabilityReport(scorecard.Key, version.Number, false,
                $"Version {version.Number} has no development baseline, so there is nothing to measure stability against. Attach one with PUT /scorecards/{scorecard.Key}/versions/{version.Number}/baseline.",
                period, query.RangeText, population, StabilityCalculator.EmptyBinRuleText, figure, []);
        }

        var scores = await ReportAggregates.DailyScoresAsync(db, scorecard.Id, version.Number, query, ct);
        var bins = new BinTally(version.Compiled, date => StabilityCalculator.Period(date, query.Period));
        await foreach (var row in ReportAggregates.DailyBinsAsync(db, scorecard.Id, version.Number, query).WithCancellation(ct))
        {
            bins.Add(row.Date, row.MatchedBins);
        }

        var periods = StabilityCalculator.Compute(version.Baseline, version.Compiled, scores, bins, query.Period, figure);
        return new StabilityReport(scorecard.Key, version.Number, true, periods.Count == 0 ? "No applications in the range." : null,
            period, query.RangeText, population, StabilityCalculator.EmptyBinRuleText, figure, periods);
    }
}

/// <summary>A version as the reports need it.</summary>
public sealed record ReportVersion(int Number, CompiledScorecard Compiled, BaselineAggregates? Baseline);
