using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Alerts;
using Ledgerline.Api.Features.Overview.Charts;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Scoring.Statistics;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Overview;

/// <summary>
/// Gathers the overview from the report services (the same figures the JSON reports answer) plus
/// the curves and cohort counts only a picture needs, all from database aggregates.
/// </summary>
public sealed class OverviewBuilder(LedgerlineDbContext db, ReportBuilder reports, TimeProvider clock)
{
    public async Task<OverviewData> BuildAsync(Scorecard scorecard, ReportQuery query, CancellationToken ct)
    {
        var versions = await reports.VersionsAsync(scorecard, ct);
        var cells = await ReportAggregates.ScoresAsync(db, scorecard.Id, query with { Version = null }, ct);

        // The performance report from the same calculator the JSON report uses, on score cells read once for it and the curves.
        var performance = new PerformanceReport(scorecard.Key, query.RangeText, cells.GroupBy(c => c.Version).OrderBy(g => g.Key)
            .Select(g => PerformanceCalculator.Compute(g.Key, versions[g.Key].Compiled, versions[g.Key].Baseline, g.ToList(), query.RangeText)).ToList());
        var comparison = await reports.ComparisonAsync(scorecard, versions, query with { Version = null }, ct);
        var shown = await ShownVersionsAsync(scorecard, performance, cells, ct);
        var stability = new Dictionary<int, StabilityReport>();
        foreach (var v in shown)
        {
            stability[v.Number] = await reports.StabilityAsync(scorecard, versions[v.Number], query with { Version = v.Number, Period = ReportPeriod.Month }, ct);
        }

        var alerts = await db.Alerts.AsNoTracking().Where(a => a.ScorecardId == scorecard.Id && a.ClosedAt == null).OrderBy(a => a.Id).ToListAsync(ct);
        var baselineShares = shown.Where(v => versions[v.Number].Baseline is not null)
            .ToDictionary(v => v.Number, v => (IReadOnlyList<double>)versions[v.Number].Baseline!.ScoreBins.Select(b => b.Share).ToList());
        return new OverviewData(
            scorecard.Key, scorecard.Name, DateOnly.FromDateTime(clock.GetUtcNow().UtcDateTime), scorecard.PerformanceWindowMonths,
            shown, performance, comparison, stability, alerts.Select(a => a.ToResponse()).ToList(),
            await reports.CohortsAsync(scorecard, query, ct), baselineShares);
    }

    /// <summary>The versions of the current plan in plan order; without a plan, every version that scored anything.</summary>
    private async Task<List<ShownVersion>> ShownVersionsAsync(Scorecard scorecard, PerformanceReport performance, List<ScoreCell> cells, CancellationToken ct)
    {
        var plan = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecard.Id).OrderByDescending(p => p.Revision).FirstOrDefaultAsync(ct);
        var roles = new List<(int Version, string Role, double? Share)>();
        if (plan is not null)
        {
            var challengers = plan.ChallengerShares();
            roles.Add((plan.ChampionVersion, "champion", 1 - challengers.Sum(c => (double)c.Share)));
            roles.AddRange(challengers.Select(c => (c.Version, "challenger", (double?)(double)c.Share)));
            roles.AddRange(plan.ShadowVersions().Select(s => (s, "shadow", (double?)null)));
        }
        else
        {
            roles.AddRange(performance.Versions.Select(v => (v.Version, "version", (double?)null)));
        }

        return roles.Select((r, i) =>
        {
            var histogram = PerformanceCalculator.Histogram(cells.Where(c => c.Version == r.Version && c.InPerformance).Select(c => (c.Score, c.Outcome, c.Count)));
            return new ShownVersion(r.Version, r.Role, r.Share, ChartPalette.ForIndex(i), Roc.Compute(histogram), KolmogorovSmirnov.Compute(histogram));
        }).ToList();
    }
}
