using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>
/// Counts maturity in the database from the decisions' current-outcome columns, grouped by
/// deciding version and role: the answer's size grows with the number of versions, not decisions.
/// </summary>
internal static class MaturityQuery
{
    public static async Task<MaturityResponse> RunAsync(LedgerlineDbContext db, Scorecard scorecard, DateOnly today, CancellationToken ct)
    {
        var rule = new OutcomeDefinitionRule(scorecard.BadDaysPastDue, scorecard.IndeterminateDaysPastDue, scorecard.PerformanceWindowMonths);
        // A window ends today or later exactly when the application date is on or after this day.
        var openFrom = rule.EarliestApplicationDateEndingOnOrAfter(today);
        var groups = await db.Decisions.AsNoTracking()
            .Where(d => d.ScorecardId == scorecard.Id)
            .GroupBy(d => new { d.Version, d.Role })
            .Select(g => new
            {
                g.Key.Version,
                g.Key.Role,
                Decided = g.Count(),
                Approved = g.Count(d => d.Band == Band.Approve),
                WithOutcome = g.Count(d => d.Outcome != null),
                Matured = g.Count(d => d.Matured),
                Bad = g.Count(d => d.Matured && d.Outcome == PerformanceClass.Bad),
                Good = g.Count(d => d.Matured && d.Outcome == PerformanceClass.Good),
                Indeterminate = g.Count(d => d.Matured && d.Outcome == PerformanceClass.Indeterminate),
                Overdue = g.Count(d => !d.Matured && d.ApplicationDate < openFrom),
                NextApplicationDate = g.Where(d => !d.Matured && d.ApplicationDate >= openFrom).Min(d => (DateOnly?)d.ApplicationDate),
            })
            .ToListAsync(ct);

        var versions = groups
            .OrderBy(g => g.Version).ThenBy(g => g.Role)
            .Select(g => new VersionMaturity(
                g.Version, g.Role, g.Decided, g.Approved, g.WithOutcome, g.Matured, g.Bad, g.Good, g.Indeterminate,
                g.Decided - g.Matured, g.Overdue,
                g.NextApplicationDate is { } first ? rule.WindowEnd(first) : null))
            .ToList();
        return new MaturityResponse(scorecard.Key, today, scorecard.PerformanceWindowMonths, versions);
    }
}
