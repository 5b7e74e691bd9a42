using System.Security.Claims;
using System.Text.Json;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Http;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Scorecards;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Ledgerline.Api.Features.Scorecards;

public static class BaselineEndpoints
{
    /// <summary>Room for a development sample of a few hundred thousand rows.</summary>
    public const long BaselineBodyLimitBytes = 256L * 1024 * 1024;

    /// <summary>How many failing records an answer lists.</summary>
    public const int MaxListedFailures = 20;

    private static readonly JsonSerializerOptions Json = CreateJsonOptions();

    public static IEndpointRouteBuilder MapBaselines(this IEndpointRouteBuilder routes)
    {
        // Analysts attach baselines; analysts and risk managers read them.
        var group = routes.MapGroup("/scorecards/{key}/versions/{version:int}/baseline").WithTags("Versions").ForScorecardRoutes();
        group.MapPut("/", PutBaseline).WithValidation<BaselineRequest>().WithBodyLimit(BaselineBodyLimitBytes).WithRequestTimeout(LimitsRegistration.BulkTimeoutPolicy).AllowRoles(Roles.Analyst);
        group.MapGet("/", GetBaseline).AllowRoles(Roles.Analyst, Roles.Risk);
        return routes;
    }

    public static async Task<Results<Ok<BaselineResponse>, ValidationProblem, ProblemHttpResult>> PutBaseline(
        string key, int version, BaselineRequest request, ClaimsPrincipal user, LedgerlineDbContext db, VersionCache cache, TimeProvider clock, CancellationToken ct)
    {
        var lookup = await ScorecardLookup.FindVersionAsync(db, key, version, ct);
        if (!lookup.Found)
        {
            return lookup.Problem;
        }

        var (scorecard, found) = (lookup.Scorecard, lookup.Version);

        if (found.Status != VersionStatus.Draft)
        {
            return Problems.Conflict($"Version {version} is {found.Status.ToWire()}; its baseline is fixed once approved, since every stability figure is measured against it.");
        }

        var compiled = cache.GetOrCompile(scorecard.Id, version, found.Content);
        BaselineAggregates aggregates;
        if (request.Records is { } records)
        {
            var built = Aggregate(compiled, records, request.ScoreBinEdges);
            if (built.Problems is not null)
            {
                return Problems.Invalid(built.Problems);
            }

            aggregates = built.Aggregates!;
        }
        else
        {
            var problems = BaselineAggregatesCheck.Validate(compiled, request.Aggregates!);
            if (problems.Count > 0)
            {
                return Problems.Invalid(problems);
            }

            aggregates = request.Aggregates! with { ScoreHistogram = request.Aggregates.ScoreHistogram ?? [] };
        }

        var now = clock.GetUtcNow();
        var actor = Actor.Of(user);
        var serialized = JsonSerializer.Serialize(aggregates, Json);
        if (found.Baseline is { } existing)
        {
            existing.Aggregates = serialized;
            existing.AttachedAt = now;
            existing.AttachedBy = actor;
        }
        else
        {
            db.Baselines.Add(new VersionBaseline { VersionId = found.Id, Aggregates = serialized, AttachedAt = now, AttachedBy = actor });
        }

        db.Record(actor, "baseline.attached", $"{key}/versions/{version}", aggregates, now);
        await db.SaveChangesAsync(ct);
        return TypedResults.Ok(new BaselineResponse(version, now, actor, aggregates));
    }

    public static async Task<Results<Ok<BaselineResponse>, ProblemHttpResult>> GetBaseline(string key, int version, LedgerlineDbContext db, CancellationToken ct)
    {
        var lookup = await ScorecardLookup.FindVersionAsync(db, key, version, ct);
        if (!lookup.Found)
        {
            return lookup.Problem;
        }

        var (scorecard, found) = (lookup.Scorecard, lookup.Version);

        return found.Baseline is { } baseline
            ? TypedResults.Ok(new BaselineResponse(version, baseline.AttachedAt, baseline.AttachedBy, Parse(baseline.Aggregates)))
            : Problems.NotFound($"Version {version} of '{key}' has no baseline yet; attach one with PUT on this address.");
    }

    /// <summary>Reads stored aggregates; reports use this too.</summary>
    public static BaselineAggregates Parse(string stored) =>
        JsonSerializer.Deserialize<BaselineAggregates>(stored, Json) ?? throw new InvalidOperationException("A stored baseline is empty.");

    private static (BaselineAggregates? Aggregates, List<FieldProblem>? Problems) Aggregate(
        CompiledScorecard compiled, IReadOnlyList<BaselineRecord> records, IReadOnlyList<decimal>? edges)
    {
        var builder = new BaselineBuilder(compiled);
        var failures = new List<FieldProblem>();
        var values = new ScoringValue[compiled.CharacteristicCount];
        for (var i = 0; i < records.Count && failures.Count < MaxListedFailures; i++)
        {
            var input = records[i].Characteristics ?? [];
            var path = $"records[{i}].characteristics";
            if (ScoringInputReader.FirstUnknownName(input.Keys, [compiled]) is { } unknown)
            {
                failures.Add(new($"{path}.{unknown}", "is not a characteristic of this version"));
                continue;
            }

            if (ScoringInputReader.Read(compiled, input, values, path) is { } problem)
            {
                failures.Add(problem);
                continue;
            }

            var result = compiled.Score(values, out var failure);
            if (result is null)
            {
                failures.Add(new($"{path}.{failure!.Characteristic}", failure.Message));
                continue;
            }

            builder.Add(result, records[i].Bad);
        }

        if (failures.Count > 0)
        {
            return (null, failures);
        }

        if (builder.HasPartialOutcomes)
        {
            return (null, [new("records", "give 'bad' on every record or on none: development AUC and KS need the outcome of every row")]);
        }

        return (builder.Build(edges, DevelopmentFigures.Compute), null);
    }

    private static JsonSerializerOptions CreateJsonOptions()
    {
        var options = new JsonSerializerOptions();
        HttpRegistration.ConfigureJson(options);
        return options;
    }
}
