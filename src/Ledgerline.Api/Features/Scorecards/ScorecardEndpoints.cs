using System.Security.Claims;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Scorecards;

public static class ScorecardEndpoints
{
    public static IEndpointRouteBuilder MapScorecards(this IEndpointRouteBuilder routes)
    {
        // Families: analysts create them; analysts and risk managers read them. Keys limited to
        // some scorecards see only those.
        var group = routes.MapGroup("/scorecards").WithTags("Scorecards").ForScorecardRoutes();
        group.MapPost("/", CreateScorecard).WithValidation<CreateScorecardRequest>().AllowRoles(Roles.Analyst);
        group.MapGet("/", ListScorecards).AllowRoles(Roles.Analyst, Roles.Risk);
        group.MapGet("/{key}", GetScorecard).AllowRoles(Roles.Analyst, Roles.Risk);
        return routes;
    }

    public static async Task<Results<Created<ScorecardResponse>, ProblemHttpResult>> CreateScorecard(
        CreateScorecardRequest request, ClaimsPrincipal user, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        if (!Actor.MayUseScorecard(user, request.Key))
        {
            return TypedResults.Problem(detail: $"This key is limited to other scorecards than '{request.Key}'.", statusCode: StatusCodes.Status403Forbidden, title: "Forbidden");
        }

        if (await db.Scorecards.AnyAsync(s => s.Key == request.Key, ct))
        {
            return Problems.Conflict($"A scorecard with key '{request.Key}' exists already; keys never change, so pick another or register a new version of that one.");
        }

        var definition = request.OutcomeDefinition!;
        var scorecard = new Scorecard
        {
            Key = request.Key,
            Name = request.Name,
            BadDaysPastDue = definition.BadDaysPastDue!.Value,
            IndeterminateDaysPastDue = definition.IndeterminateDaysPastDue!.Value,
            PerformanceWindowMonths = definition.PerformanceWindowMonths!.Value,
            CreatedAt = clock.GetUtcNow(),
            CreatedBy = Actor.Of(user),
        };
        db.Scorecards.Add(scorecard);
        db.Record(scorecard.CreatedBy, "scorecard.created", scorecard.Key, request, scorecard.CreatedAt);
        try
        {
            await db.SaveChangesAsync(ct);
        }
        catch (DbUpdateException)
        {
            return Problems.Conflict($"A scorecard with key '{request.Key}' exists already.");
        }

        return TypedResults.Created($"/scorecards/{scorecard.Key}", ToResponse(scorecard));
    }

    public static async Task<Ok<List<ScorecardResponse>>> ListScorecards(ClaimsPrincipal user, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecards = await db.Scorecards.AsNoTracking().Include(s => s.Versions).ThenInclude(v => v.Baseline)
            .OrderBy(s => s.Key).ToListAsync(ct);
        return TypedResults.Ok(scorecards.Where(s => Actor.MayUseScorecard(user, s.Key)).Select(ToResponse).ToList());
    }

    public static async Task<Results<Ok<ScorecardResponse>, ProblemHttpResult>> GetScorecard(string key, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecard = await db.Scorecards.AsNoTracking().Include(s => s.Versions).ThenInclude(v => v.Baseline)
            .FirstOrDefaultAsync(s => s.Key == key, ct);
        return scorecard is null ? ScorecardLookup.NotFound(key) : TypedResults.Ok(ToResponse(scorecard));
    }

    private static ScorecardResponse ToResponse(Scorecard s) => new(
        s.Key,
        s.Name,
        new OutcomeDefinition(s.BadDaysPastDue, s.IndeterminateDaysPastDue, s.PerformanceWindowMonths),
        s.CreatedAt,
        s.CreatedBy,
        s.Versions.OrderBy(v => v.Number)
            .Select(v => new VersionSummary(v.Number, v.Status.ToWire(), v.ContentHash, v.Baseline is not null)).ToList());
}
