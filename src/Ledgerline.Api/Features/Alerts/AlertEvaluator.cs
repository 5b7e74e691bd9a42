using System.Globalization;
using System.Text.Json;
using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Api.Features.Scorecards;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace Ledgerline.Api.Features.Alerts;

/// <summary>
/// Evaluates a scorecard's alert conditions from the reports, raises new alerts once and closes
/// those whose condition cleared. Safe with several instances: a second raise of the same open
/// alert collides on the unique index and is dropped; closing is a conditional update.
/// </summary>
public sealed class AlertEvaluator(LedgerlineDbContext db, ReportBuilder reports, TimeProvider clock, IOptions<AlertOptions> options, ILogger<AlertEvaluator> logger)
{
    public async Task<EvaluationResponse> EvaluateAsync(Scorecard scorecard, CancellationToken ct)
    {
        var now = clock.GetUtcNow();
        var found = await FindAsync(scorecard, ct);
        var open = await db.Alerts.Where(a => a.ScorecardId == scorecard.Id && a.ClosedAt == null).ToListAsync(ct);
        var opened = 0;
        foreach (var condition in found)
        {
            var existing = open.FirstOrDefault(a => a.Kind == condition.Kind && a.Version == condition.Version && a.Subject == condition.Subject);
            if (existing is not null)
            {
                existing.Figure = condition.Figure;
                existing.Threshold = condition.Threshold;
                existing.Severity = condition.Severity;
                existing.Period = condition.Period;
                existing.Evidence = condition.Evidence;
                existing.LastSeenAt = now;
                continue;
            }

            if (await TryRaiseAsync(scorecard, condition, now, ct))
            {
                opened++;
            }
        }

        await db.SaveChangesAsync(ct);
        var cleared = open.Where(a => !found.Any(c => c.Kind == a.Kind && c.Version == a.Version && c.Subject == a.Subject)).Select(a => a.Id).ToList();
        var closed = cleared.Count == 0 ? 0 : await db.Alerts.Where(a => cleared.Contains(a.Id) && a.ClosedAt == null)
            .ExecuteUpdateAsync(s => s.SetProperty(a => a.ClosedAt, now), ct);
        var stillOpen = await db.Alerts.AsNoTracking().Where(a => a.ScorecardId == scorecard.Id && a.ClosedAt == null).OrderBy(a => a.Id).ToListAsync(ct);
        return new EvaluationResponse(scorecard.Key, now, opened, closed, stillOpen.Select(a => a.ToResponse()).ToList());
    }

    private async Task<bool> TryRaiseAsync(Scorecard scorecard, Condition condition, DateTimeOffset now, CancellationToken ct)
    {
        var alert = new Alert
        {
            ScorecardId = scorecard.Id,
            Kind = condition.Kind,
            Version = condition.Version,
            Subject = condition.Subject,
            Period = condition.Period,
            Severity = condition.Severity,
            Figure = condition.Figure,
            Threshold = condition.Threshold,
            Evidence = condition.Evidence,
            OpenedAt = now,
            LastSeenAt = now,
        };
        db.Alerts.Add(alert);
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateException)
        {
            // Another instance raised the same alert first: it stays raised once.
            db.Entry(alert).State = EntityState.Detached;
            return false;
        }

        if (!string.IsNullOrWhiteSpace(options.Value.WebhookUrl))
        {
            var payload = JsonSerializer.Serialize(new { scorecard = scorecard.Key, alert = alert.ToResponse() }, JsonSerializerOptions.Web);
            db.AlertDeliveries.Add(new AlertDelivery { AlertId = alert.Id, Payload = payload, NextAttemptAt = now });
            await db.SaveChangesAsync(ct);
        }

        logger.LogInformation("Alert {Kind} raised for {Scorecard} version {Version} ({Subject}): {Figure}", alert.Kind, scorecard.Key, alert.Version, alert.Subject, alert.Figure);
        return true;
    }

    /// <summary>The conditions that hold now, over the versions in the newest traffic plan.</summary>
    private async Task<List<Condition>> FindAsync(Scorecard scorecard, CancellationToken ct)
    {
        var conditions = new List<Condition>();
        var plan = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecard.Id).OrderByDescending(p => p.Revision).FirstOrDefaultAsync(ct);
        if (plan is null)
        {
            return conditions;
        }

        var thresholds = await reports.ThresholdsAsync(scorecard.Id, ct);
        var versions = await reports.VersionsAsync(scorecard, ct);
        var watched = new[] { plan.ChampionVersion }.Concat(plan.ChallengerShares().Select(c => c.Version)).Concat(plan.ShadowVersions())
            .Distinct().Where(versions.ContainsKey).ToList();
        var all = new ReportQuery(null, null, null, ReportPeriod.Month);

        foreach (var number in watched)
        {
            var stability = await reports.StabilityAsync(scorecard, versions[number], all, ct);
            if (stability.Available && stability.Periods.Count > 0)
            {
                var latest = stability.Periods[^1];
                if (latest.Psi is { } psi && psi >= thresholds.PsiAmber)
                {
                    var red = psi >= thresholds.PsiRed;
                    conditions.Add(new Condition("psi", number, "score", latest.Period, red ? "red" : "amber", psi, red ? thresholds.PsiRed : thresholds.PsiAmber,
                        Text($"PSI of version {number}'s score in {latest.Period} is {psi:0.0000} against its development baseline ({latest.N} applications scored); the {(red ? "red" : "amber")} threshold is {(red ? thresholds.PsiRed : thresholds.PsiAmber)}.")));
                }

                foreach (var characteristic in latest.Characteristics)
                {
                    if (characteristic.Csi is { } csi && csi >= thresholds.CsiAmber)
                    {
                        var red = csi >= thresholds.CsiRed;
                        conditions.Add(new Condition("csi", number, characteristic.Name, latest.Period, red ? "red" : "amber", csi, red ? thresholds.CsiRed : thresholds.CsiAmber,
                            Text($"CSI of '{characteristic.Name}' for version {number} in {latest.Period} is {csi:0.0000} against its development baseline; the {(red ? "red" : "amber")} threshold is {(red ? thresholds.CsiRed : thresholds.CsiAmber)}.")));
                    }
                }
            }
        }

        var performance = await reports.PerformanceAsync(scorecard, versions, all, ct);
        foreach (var version in performance.Versions.Where(v => watched.Contains(v.Version)))
        {
            if (version.Development is { Auc: { } developmentAuc } && version.Auc is { } auc && developmentAuc - auc > thresholds.AucDecline)
            {
                conditions.Add(new Condition("aucDecline", version.Version, "auc", "all application dates", "red", developmentAuc - auc, thresholds.AucDecline,
                    Text($"AUC of version {version.Version} is {auc:0.0000} on {version.Matured} matured approved applications, {developmentAuc - auc:0.0000} below its development AUC {developmentAuc:0.0000}; the alert threshold is a decline of more than {thresholds.AucDecline}.")));
            }

            if (version.HosmerLemeshow.PValue is { } p && p < thresholds.HosmerLemeshowP)
            {
                conditions.Add(new Condition("hosmerLemeshow", version.Version, "calibration", "all application dates", "red", p, thresholds.HosmerLemeshowP,
                    Text($"Hosmer-Lemeshow p-value of version {version.Version} is {p:0.000000} ({version.HosmerLemeshow.Statistic:0.00} on {version.HosmerLemeshow.DegreesOfFreedom} degrees of freedom, {version.Matured} matured approved applications); the threshold is p < {thresholds.HosmerLemeshowP}.")));
            }
        }

        var comparison = await reports.ComparisonAsync(scorecard, versions, all, ct);
        foreach (var check in comparison.SampleRatio)
        {
            if (check.PValue is { } p && p < thresholds.SampleRatioP)
            {
                conditions.Add(new Condition("sampleRatio", plan.ChampionVersion, $"revision {check.PlanRevision}", $"plan revision {check.PlanRevision}", "red", p, thresholds.SampleRatioP,
                    Text($"The realised split of plan revision {check.PlanRevision} differs from the planned shares: chi-square {check.ChiSquare:0.00} on {check.DegreesOfFreedom} degrees of freedom, p = {p:0.000000}; the threshold is p < {thresholds.SampleRatioP}.")));
            }
        }

        return conditions;
    }

    private static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);

    private sealed record Condition(string Kind, int Version, string Subject, string Period, string Severity, double Figure, double Threshold, string Evidence);
}
