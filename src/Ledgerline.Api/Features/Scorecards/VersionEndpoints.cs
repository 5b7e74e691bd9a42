using System.Security.Claims;
using System.Text;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Http;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Features.Scorecards;

public static class VersionEndpoints
{
    /// <summary>A 200-characteristic × 50-bin table is about 1 MB of JSON; leave room above it.</summary>
    public const long VersionBodyLimitBytes = 8 * 1024 * 1024;

    public static IEndpointRouteBuilder MapVersions(this IEndpointRouteBuilder routes)
    {
        // Analysts register and try versions; risk managers approve and retire them (never the
        // key that registered the version: four eyes). Both read.
        var group = routes.MapGroup("/scorecards/{key}/versions").WithTags("Versions").ForScorecardRoutes();
        group.MapPost("/", RegisterVersion).WithValidation<RegisterVersionRequest>().WithBodyLimit(VersionBodyLimitBytes).AllowRoles(Roles.Analyst);
        group.MapGet("/", ListVersions).AllowRoles(Roles.Analyst, Roles.Risk);
        group.MapGet("/{version:int}", GetVersion).AllowRoles(Roles.Analyst, Roles.Risk);
        group.MapPost("/{version:int}/approval", ApproveVersion).AllowRoles(Roles.Risk);
        group.MapPost("/{version:int}/retirement", RetireVersion).AllowRoles(Roles.Risk);
        group.MapPost("/{version:int}/score", TryVersion).WithValidation<ScoreRequest>().AllowRoles(Roles.Analyst);
        return routes;
    }

    public static async Task<Results<Created<RegisteredVersionResponse>, Ok<RegisteredVersionResponse>, ProblemHttpResult>> RegisterVersion(
        string key, RegisterVersionRequest request, ClaimsPrincipal user, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var definition = request.ToDefinition();
        var content = ScorecardContent.CanonicalJson(definition);
        var hash = ScorecardContent.Hash(definition);
        for (var attempt = 0; ; attempt++)
        {
            var existing = await db.Versions.AsNoTracking().FirstOrDefaultAsync(v => v.ScorecardId == scorecard.Id && v.ContentHash == hash, ct);
            if (existing is not null)
            {
                return TypedResults.Ok(new RegisteredVersionResponse(existing.Number, existing.Status.ToWire(), existing.ContentHash));
            }

            var number = 1 + (await db.Versions.Where(v => v.ScorecardId == scorecard.Id).MaxAsync(v => (int?)v.Number, ct) ?? 0);
            var version = new ScorecardVersion
            {
                ScorecardId = scorecard.Id,
                Number = number,
                Status = VersionStatus.Draft,
                ContentHash = hash,
                Content = Encoding.UTF8.GetString(content),
                RegisteredAt = clock.GetUtcNow(),
                RegisteredBy = Actor.Of(user),
            };
            db.Versions.Add(version);
            db.Record(version.RegisteredBy, "version.registered", $"{key}/versions/{number}", new { contentHash = hash }, version.RegisteredAt);
            try
            {
                await db.SaveChangesAsync(ct);
                return TypedResults.Created($"/scorecards/{key}/versions/{number}", new RegisteredVersionResponse(number, "draft", hash));
            }
            catch (DbUpdateException) when (attempt < 5)
            {
                // Another registration took this number or this content meanwhile; look again.
                db.ChangeTracker.Clear();
            }
        }
    }

    public static async Task<Results<Ok<List<VersionResponse>>, ProblemHttpResult>> ListVersions(string key, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var versions = await db.Versions.AsNoTracking().Include(v => v.Baseline)
            .Where(v => v.ScorecardId == scorecard.Id).OrderBy(v => v.Number).ToListAsync(ct);
        return TypedResults.Ok(versions.Select(ToResponse).ToList());
    }

    public static async Task<Results<Ok<VersionResponse>, ProblemHttpResult>> GetVersion(string key, int version, LedgerlineDbContext db, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var found = await ScorecardLookup.FindVersionAsync(db, scorecard.Id, version, ct);
        return found is null ? ScorecardLookup.VersionNotFound(key, version) : TypedResults.Ok(ToResponse(found));
    }

    public static async Task<Results<Ok<VersionResponse>, ProblemHttpResult>> ApproveVersion(
        string key, int version, ClaimsPrincipal user, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        var lookup = await ScorecardLookup.FindVersionAsync(db, key, version, ct);
        if (!lookup.Found)
        {
            return lookup.Problem;
        }

        var (scorecard, found) = (lookup.Scorecard, lookup.Version);

        if (found.Status != VersionStatus.Draft)
        {
            return Problems.Conflict($"Version {version} is {found.Status.ToWire()}; only a draft can be approved.");
        }

        if (found.Baseline is null)
        {
            return Problems.Conflict($"Version {version} has no development baseline; attach one with PUT /scorecards/{key}/versions/{version}/baseline before approval.");
        }

        var actor = Actor.Of(user);
        if (found.RegisteredBy == actor)
        {
            return TypedResults.Problem(
                detail: $"This key registered version {version}; a second person must approve it (four-eyes rule).",
                statusCode: StatusCodes.Status403Forbidden,
                title: "Four-eyes rule");
        }

        found.Status = VersionStatus.Approved;
        found.ApprovedAt = clock.GetUtcNow();
        found.ApprovedBy = actor;
        db.Record(actor, "version.approved", $"{key}/versions/{version}", new { contentHash = found.ContentHash, status = "approved" }, found.ApprovedAt.Value);
        await db.SaveChangesAsync(ct);
        return TypedResults.Ok(ToResponse(found));
    }

    public static async Task<Results<Ok<VersionResponse>, ProblemHttpResult>> RetireVersion(
        string key, int version, ClaimsPrincipal user, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        var lookup = await ScorecardLookup.FindVersionAsync(db, key, version, ct);
        if (!lookup.Found)
        {
            return lookup.Problem;
        }

        var (scorecard, found) = (lookup.Scorecard, lookup.Version);

        if (found.Status == VersionStatus.Retired)
        {
            return Problems.Conflict($"Version {version} is retired already.");
        }

        var plan = await db.TrafficPlans.AsNoTracking().Where(p => p.ScorecardId == scorecard.Id)
            .OrderByDescending(p => p.Revision).FirstOrDefaultAsync(ct);
        if (plan is not null && plan.Includes(version))
        {
            return Problems.Conflict($"Version {version} is in traffic plan revision {plan.Revision}; change the plan (PUT /scorecards/{key}/traffic) before retiring it.");
        }

        found.Status = VersionStatus.Retired;
        found.RetiredAt = clock.GetUtcNow();
        found.RetiredBy = Actor.Of(user);
        db.Record(found.RetiredBy, "version.retired", $"{key}/versions/{version}", new { contentHash = found.ContentHash, status = "retired" }, found.RetiredAt.Value);
        await db.SaveChangesAsync(ct);
        return TypedResults.Ok(ToResponse(found));
    }

    public static async Task<Results<Ok<ScoreResponse>, ValidationProblem, ProblemHttpResult>> TryVersion(
        string key, int version, ScoreRequest request, LedgerlineDbContext db, VersionCache cache, CancellationToken ct)
    {
        var lookup = await ScorecardLookup.FindVersionAsync(db, key, version, ct);
        if (!lookup.Found)
        {
            return lookup.Problem;
        }

        var (scorecard, found) = (lookup.Scorecard, lookup.Version);

        var compiled = cache.GetOrCompile(scorecard.Id, version, found.Content);
        var input = request.Characteristics!;
        if (ScoringInputReader.FirstUnknownName(input.Keys, [compiled]) is { } unknown)
        {
            return Problems.Invalid($"characteristics.{unknown}",
                $"version {version} has no characteristic '{unknown}'; it uses: {string.Join(", ", compiled.Definition.Characteristics.Select(c => c.Name))}");
        }

        var values = new ScoringValue[compiled.CharacteristicCount];
        if (ScoringInputReader.Read(compiled, input, values) is { } problem)
        {
            return Problems.Invalid([problem]);
        }

        var result = compiled.Score(values, out var failure);
        return result is null
            ? Problems.Invalid($"characteristics.{failure!.Characteristic}", failure.Message)
            : TypedResults.Ok(ScoreMapping.ToResponse(compiled, version, result));
    }

    private static VersionResponse ToResponse(ScorecardVersion v) => new(
        v.Number,
        v.Status.ToWire(),
        v.ContentHash,
        v.RegisteredAt,
        v.RegisteredBy,
        v.ApprovedAt,
        v.ApprovedBy,
        v.RetiredAt,
        v.RetiredBy,
        v.Baseline is not null,
        VersionMapping.ParseStored(v.Content).ToDocument());
}
