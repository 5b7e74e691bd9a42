using FluentValidation;
using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Features.Traffic;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Mvc;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Decisions;

public static class DecisionsEndpoints
{
    public const int MaxBatchItems = 1000;

    /// <summary>1,000 applications of a few hundred characteristics each fit well within this.</summary>
    public const long BatchBodyLimitBytes = 16 * 1024 * 1024;

    public static IEndpointRouteBuilder MapDecisions(this IEndpointRouteBuilder routes)
    {
        // Origination systems decide; they, risk managers and analysts read a logged decision.
        var group = routes.MapGroup("/scorecards/{key}/decisions").WithTags("Decisions").ForScorecardRoutes();
        group.MapPost("/", Decide).WithValidation<DecisionRequest>().AllowRoles(Roles.Scoring);
        group.MapPost("/batch", DecideBatch).WithValidation<DecisionBatchRequest>().WithBodyLimit(BatchBodyLimitBytes).AllowRoles(Roles.Scoring);
        group.MapGet("/{applicationId}", GetDecision).AllowRoles(Roles.Scoring, Roles.Risk, Roles.Analyst);
        return routes;
    }

    public static async Task<Results<Created<DecisionResponse>, Ok<DecisionResponse>, ValidationProblem, ProblemHttpResult>> Decide(
        string key,
        DecisionRequest request,
        [FromHeader(Name = "Idempotency-Key")] string? idempotencyKey,
        LedgerlineDbContext db,
        PlanCache plans,
        DecisionWriter writer,
        TimeProvider clock,
        CancellationToken ct)
    {
        if (idempotencyKey is not null && (idempotencyKey.Trim().Length == 0 || idempotencyKey.Length > DecisionRequestValidator.MaxKeyLength))
        {
            return Problems.Invalid("Idempotency-Key", $"must be 1 to {DecisionRequestValidator.MaxKeyLength} characters; leave the header out to use the application id");
        }

        var lookup = await plans.GetAsync(key, db, ct);
        if (lookup.State != PlanState.Ready)
        {
            return lookup.State == PlanState.NoScorecard ? ScorecardLookup.NotFound(key) : NoPlan(key);
        }

        var prepared = DecisionMaker.Prepare(lookup.Plan!, request, idempotencyKey ?? request.ApplicationId!, clock.GetUtcNow(), out var problem);
        if (prepared is null)
        {
            return Problems.Invalid(problem!.Path, problem.Message);
        }

        // Not cancellable once queued: a decision that commits must be answered as committed.
        if (await writer.WriteAsync(prepared.Record))
        {
            return TypedResults.Created(Location(key, request.ApplicationId!), prepared.Response);
        }

        var (replay, conflict) = await DuplicateResolution.ResolveAsync(db, prepared.Record, prepared.Response, ct);
        return replay is not null ? TypedResults.Ok(replay) : Problems.Conflict(conflict!);
    }

    public static async Task<Results<Ok<DecisionBatchResponse>, ValidationProblem, ProblemHttpResult>> DecideBatch(
        string key,
        DecisionBatchRequest request,
        IValidator<DecisionRequest> itemValidator,
        LedgerlineDbContext db,
        PlanCache plans,
        DecisionWriter writer,
        TimeProvider clock,
        CancellationToken ct)
    {
        var lookup = await plans.GetAsync(key, db, ct);
        if (lookup.State != PlanState.Ready)
        {
            return lookup.State == PlanState.NoScorecard ? ScorecardLookup.NotFound(key) : NoPlan(key);
        }

        var items = request.Applications!;
        var results = new DecisionBatchItem?[items.Count];
        var writes = new List<(int Index, PreparedDecision Prepared, Task<bool> Inserted)>(items.Count);
        var now = clock.GetUtcNow();
        for (var i = 0; i < items.Count; i++)
        {
            var item = items[i];
            var prefix = $"applications[{i}].";
            if (item is null)
            {
                results[i] = new DecisionBatchItem(i, null, StatusCodes.Status400BadRequest, null, $"applications[{i}]: must be an application object, not null");
                continue;
            }

            var validation = await itemValidator.ValidateAsync(item, ct);
            if (!validation.IsValid)
            {
                var text = string.Join("; ", validation.Errors.Select(e => $"{prefix}{e.PropertyName}: {e.ErrorMessage}"));
                results[i] = new DecisionBatchItem(i, item.ApplicationId, StatusCodes.Status400BadRequest, null, text);
                continue;
            }

            var prepared = DecisionMaker.Prepare(lookup.Plan!, item, item.ApplicationId!, now, out var problem, prefix);
            if (prepared is null)
            {
                results[i] = new DecisionBatchItem(i, item.ApplicationId, StatusCodes.Status400BadRequest, null, $"{problem!.Path}: {problem.Message}");
                continue;
            }

            writes.Add((i, prepared, writer.WriteAsync(prepared.Record)));
        }

        foreach (var (index, prepared, inserted) in writes)
        {
            if (await inserted)
            {
                results[index] = new DecisionBatchItem(index, prepared.Response.ApplicationId, StatusCodes.Status201Created, prepared.Response, null);
                continue;
            }

            var (replay, conflict) = await DuplicateResolution.ResolveAsync(db, prepared.Record, prepared.Response, ct);
            results[index] = replay is not null
                ? new DecisionBatchItem(index, replay.ApplicationId, StatusCodes.Status200OK, replay, null)
                : new DecisionBatchItem(index, prepared.Record.ApplicationId, StatusCodes.Status409Conflict, null, $"applications[{index}]: {conflict}");
        }

        var all = results.Select(r => r!).ToList();
        return TypedResults.Ok(new DecisionBatchResponse(
            all.Count(r => r.Status == StatusCodes.Status201Created),
            all.Count(r => r.Status == StatusCodes.Status200OK),
            all.Count(r => r.Status >= 400),
            all));
    }

    public static async Task<Results<Ok<DecisionRecordResponse>, ProblemHttpResult>> GetDecision(
        string key, string applicationId, LedgerlineDbContext db, VersionCache versions, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var decision = await db.Decisions.AsNoTracking().Include(d => d.Scores)
            .FirstOrDefaultAsync(d => d.ScorecardId == scorecard.Id && d.ApplicationId == applicationId, ct);
        if (decision is null)
        {
            return Problems.NotFound($"Scorecard '{key}' has no decision for application '{applicationId}'.");
        }

        var observations = await db.Outcomes.AsNoTracking().Where(o => o.DecisionId == decision.Id)
            .OrderBy(o => o.ObservedAt).ThenBy(o => o.Id).ToListAsync(ct);
        var record = await DecisionRecordMapping.ToRecordAsync(db, versions, decision, observations, ct);
        return TypedResults.Ok(record);
    }

    private static ProblemHttpResult NoPlan(string key) =>
        Problems.Conflict($"Scorecard '{key}' has no traffic plan yet, so no version may decide; a risk manager sets one with PUT /scorecards/{key}/traffic naming an approved champion.");

    private static string Location(string key, string applicationId) =>
        $"/scorecards/{Uri.EscapeDataString(key)}/decisions/{Uri.EscapeDataString(applicationId)}";
}
