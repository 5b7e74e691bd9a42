using System.Security.Claims;
using FluentValidation;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Alerts;

public static class AlertsEndpoints
{
    public static IEndpointRouteBuilder MapAlerts(this IEndpointRouteBuilder routes)
    {
        // Risk managers and analysts read alerts and thresholds; only risk managers evaluate on demand or change thresholds.
        var group = routes.MapGroup("/scorecards/{key}").WithTags("Alerts").ForScorecardRoutes();
        group.MapGet("/alerts", ListAlerts).AllowRoles(Roles.Risk, Roles.Analyst);
        group.MapPost("/alerts/evaluation", EvaluateAlerts).AllowRoles(Roles.Risk);
        group.MapGet("/alert-thresholds", GetThresholds).AllowRoles(Roles.Risk, Roles.Analyst);
        group.MapPut("/alert-thresholds", PutThresholds).WithValidation<AlertThresholdsRequest>().AllowRoles(Roles.Risk);
        return routes;
    }

    public static async Task<Results<Ok<AlertListResponse>, ProblemHttpResult>> ListAlerts(string key, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var open = await db.Alerts.AsNoTracking().Where(a => a.ScorecardId == scorecard.Id && a.ClosedAt == null).OrderBy(a => a.Id).ToListAsync(ct);
        return TypedResults.Ok(new AlertListResponse(key, open.Select(a => a.ToResponse()).ToList()));
    }

    public static async Task<Results<Ok<EvaluationResponse>, ProblemHttpResult>> EvaluateAlerts(string key, LedgerlineDbContext db, AlertEvaluator evaluator, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        return TypedResults.Ok(await evaluator.EvaluateAsync(scorecard, ct));
    }

    public static async Task<Results<Ok<AlertThresholdsResponse>, ProblemHttpResult>> GetThresholds(string key, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var stored = await db.MonitoringThresholds.AsNoTracking().FirstOrDefaultAsync(t => t.ScorecardId == scorecard.Id, ct);
        return TypedResults.Ok(AlertThresholdsResponse.From(stored ?? MonitoringThresholds.Defaults(scorecard.Id), stored is null));
    }

    public static async Task<Results<Ok<AlertThresholdsResponse>, ValidationProblem, ProblemHttpResult>> PutThresholds(
        string key, AlertThresholdsRequest request, ClaimsPrincipal user, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var now = clock.GetUtcNow();
        var actor = Actor.Of(user);
        var stored = await db.MonitoringThresholds.FirstOrDefaultAsync(t => t.ScorecardId == scorecard.Id, ct);
        if (stored is null)
        {
            stored = MonitoringThresholds.Defaults(scorecard.Id);
            db.MonitoringThresholds.Add(stored);
        }

        stored.PsiAmber = request.PsiAmber!.Value;
        stored.PsiRed = request.PsiRed!.Value;
        stored.CsiAmber = request.CsiAmber!.Value;
        stored.CsiRed = request.CsiRed!.Value;
        stored.AucDecline = request.AucDecline!.Value;
        stored.HosmerLemeshowP = request.HosmerLemeshowP!.Value;
        stored.SampleRatioP = request.SampleRatioP!.Value;
        stored.UpdatedAt = now;
        stored.UpdatedBy = actor;
        db.Record(actor, "alert-thresholds.set", $"{key}/alert-thresholds", request, now);
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateException)
        {
            return Problems.Conflict("The thresholds were changed by another request at the same moment; read them and try again.");
        }

        return TypedResults.Ok(AlertThresholdsResponse.From(stored, false));
    }
}
