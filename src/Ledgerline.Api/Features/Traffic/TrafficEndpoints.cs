using System.Security.Claims;
using System.Security.Cryptography;
using System.Text.Json;
using FluentValidation;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Traffic;

public static class TrafficEndpoints
{
    public static IEndpointRouteBuilder MapTraffic(this IEndpointRouteBuilder routes)
    {
        // Risk managers set the plan; analysts and risk managers read it and its history.
        var group = routes.MapGroup("/scorecards/{key}/traffic").WithTags("Traffic").ForScorecardRoutes();
        group.MapPut("/", ChangeTrafficPlan).WithValidation<TrafficPlanRequest>().AllowRoles(Roles.Risk);
        group.MapGet("/", GetTrafficPlan).AllowRoles(Roles.Risk, Roles.Analyst);
        group.MapGet("/history", GetTrafficHistory).AllowRoles(Roles.Risk, Roles.Analyst);
        return routes;
    }

    public static async Task<Results<Ok<TrafficPlanResponse>, ValidationProblem, ProblemHttpResult>> ChangeTrafficPlan(
        string key, TrafficPlanRequest request, ClaimsPrincipal user, LedgerlineDbContext db, PlanCache cache, TimeProvider clock, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var named = TrafficPlanRequestValidator.Versions(request).ToList();
        var statuses = await db.Versions.AsNoTracking()
            .Where(v => v.ScorecardId == scorecard.Id && named.Contains(v.Number))
            .ToDictionaryAsync(v => v.Number, v => v.Status, ct);
        foreach (var (path, version) in NamedVersions(request))
        {
            if (!statuses.TryGetValue(version, out var status))
            {
                return Problems.Invalid(path, $"scorecard '{key}' has no version {version}; GET /scorecards/{key}/versions lists its versions");
            }

            if (status != VersionStatus.Approved)
            {
                return Problems.Conflict(
                    $"{path}: version {version} is {status.ToWire()}; only approved versions take traffic."
                    + (status == VersionStatus.Draft ? $" Approve it first (POST /scorecards/{key}/versions/{version}/approval)." : " Name an approved version instead."));
            }
        }

        var actor = Actor.Of(user);
        var challengers = (request.Challengers ?? []).Select(c => new ChallengerShare(c.Version!.Value, c.Share!.Value)).ToList();
        var shadows = (request.Shadows ?? []).ToList();
        for (var attempt = 0; ; attempt++)
        {
            var previous = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecard.Id)
                .OrderByDescending(p => p.Revision).FirstOrDefaultAsync(ct);
            var plan = new TrafficPlanRevision
            {
                ScorecardId = scorecard.Id,
                Revision = (previous?.Revision ?? 0) + 1,
                Salt = previous is null || request.Reshuffle == true ? NewSalt() : previous.Salt,
                ChampionVersion = request.Champion!.Value,
                Challengers = JsonSerializer.Serialize(challengers, JsonSerializerOptions.Web),
                Shadows = JsonSerializer.Serialize(shadows, JsonSerializerOptions.Web),
                Reason = request.Reason!,
                ChangedBy = actor,
                ChangedAt = clock.GetUtcNow(),
            };
            db.TrafficPlans.Add(plan);
            var promoted = previous is not null && previous.ChampionVersion != plan.ChampionVersion ? plan.ChampionVersion : (int?)null;
            db.Record(actor, "traffic.changed", $"{key}/traffic/{plan.Revision}", new
            {
                revision = plan.Revision,
                champion = plan.ChampionVersion,
                previousChampion = previous?.ChampionVersion,
                promotedToChampion = promoted,
                challengers,
                shadows,
                reason = plan.Reason,
                reshuffled = previous is not null && plan.Salt != previous.Salt,
            }, plan.ChangedAt);
            try
            {
                await db.SaveChangesAsync(ct);
                cache.Invalidate(key);
                return TypedResults.Ok(ToResponse(plan));
            }
            catch (DbUpdateException) when (attempt < 5)
            {
                // Another change took this revision number meanwhile; build on the newer one.
                db.ChangeTracker.Clear();
            }
        }
    }

    public static async Task<Results<Ok<TrafficPlanResponse>, ProblemHttpResult>> GetTrafficPlan(string key, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var plan = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecard.Id)
            .OrderByDescending(p => p.Revision).FirstOrDefaultAsync(ct);
        return plan is null ? NoPlan(key) : TypedResults.Ok(ToResponse(plan));
    }

    public static async Task<Results<Ok<TrafficHistoryResponse>, ProblemHttpResult>> GetTrafficHistory(string key, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var plans = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecard.Id)
            .OrderByDescending(p => p.Revision).ToListAsync(ct);
        return TypedResults.Ok(new TrafficHistoryResponse(plans.Select(ToResponse).ToList()));
    }

    /// <summary>The answer when a scorecard has no plan yet: names the fix.</summary>
    public static ProblemHttpResult NoPlan(string key) =>
        Problems.NotFound($"Scorecard '{key}' has no traffic plan yet; a risk manager sets one with PUT /scorecards/{key}/traffic naming an approved champion.");

    private static IEnumerable<(string Path, int Version)> NamedVersions(TrafficPlanRequest request)
    {
        yield return ("champion", request.Champion!.Value);
        var challengers = request.Challengers ?? [];
        for (var i = 0; i < challengers.Count; i++)
        {
            yield return ($"challengers[{i}].version", challengers[i].Version!.Value);
        }

        var shadows = request.Shadows ?? [];
        for (var i = 0; i < shadows.Count; i++)
        {
            yield return ($"shadows[{i}]", shadows[i]);
        }
    }

    /// <summary>128 random bits as hexadecimal: never holds the 0x00 separator of the assignment hash.</summary>
    private static string NewSalt() => Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(16));

    private static TrafficPlanResponse ToResponse(TrafficPlanRevision p)
    {
        var challengers = p.ChallengerShares();
        return new TrafficPlanResponse(p.Revision, p.ChampionVersion, 1m - challengers.Sum(c => c.Share), challengers, p.ShadowVersions(), p.Reason, p.ChangedBy, p.ChangedAt);
    }
}
