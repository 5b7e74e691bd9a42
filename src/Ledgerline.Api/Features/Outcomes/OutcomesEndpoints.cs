using System.Security.Claims;
using Ledgerline.Api.Data;
using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;
using Microsoft.Net.Http.Headers;

namespace Ledgerline.Api.Features.Outcomes;

public static class OutcomesEndpoints
{
    /// <summary>Rows one request may carry.</summary>
    public const int MaxRowsPerRequest = 50_000;

    /// <summary>Room for 50,000 rows with long application ids (a typical row is 80–120 bytes).</summary>
    public const long OutcomesBodyLimitBytes = 16L * 1024 * 1024;

    /// <summary>Rows checked and written per database round: big enough to amortise the queries, small enough to keep memory flat.</summary>
    internal const int ChunkRows = 2_000;

    public static IEndpointRouteBuilder MapOutcomes(this IEndpointRouteBuilder routes)
    {
        // The body is read by hand (JSON or CSV, streamed), so no Accepts metadata: its content-type
        // routing would answer unsupported types before the handler could explain them.
        // Servicing systems post outcomes; analysts and risk managers read maturity.
        var group = routes.MapGroup("/scorecards/{key}").WithTags("Outcomes").ForScorecardRoutes();
        group.MapPost("/outcomes", RecordOutcomes)
            .WithDescription(
                "Body: application/json { \"outcomes\": [ { \"applicationId\", \"observedAt\": \"yyyy-MM-dd\", \"worstDaysPastDue\" | \"chargedOff\" | \"status\" } ] }, " +
                "or text/csv with a header row of the same field names. Up to 50,000 rows. Query atomic=true: one bad row stores nothing.")
            .ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType)
            .WithBodyLimit(OutcomesBodyLimitBytes)
            .WithRequestTimeout(LimitsRegistration.BulkTimeoutPolicy)
            .AllowRoles(Roles.Outcomes);
        group.MapGet("/maturity", GetMaturity).AllowRoles(Roles.Risk, Roles.Analyst);
        return routes;
    }

    /// <summary>
    /// Stores a batch of outcome rows (JSON or CSV). Good rows are stored and bad ones listed;
    /// with <c>atomic=true</c> one bad row stores nothing. A body that cannot be read at all
    /// stores nothing either.
    /// </summary>
    public static async Task<Results<Ok<RecordOutcomesResponse>, ProblemHttpResult>> RecordOutcomes(
        string key, bool? atomic, HttpRequest request, ClaimsPrincipal user, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var format = FormatOf(request.ContentType);
        if (format is null)
        {
            return TypedResults.Problem(
                title: "Unsupported body type",
                detail: $"Send outcomes as application/json ({{ \"outcomes\": [ … ] }}) or as text/csv with a header row; got '{request.ContentType ?? "no Content-Type"}'.",
                statusCode: StatusCodes.Status415UnsupportedMediaType);
        }

        await using var body = await SpooledBody.CopyAsync(request.Body, OutcomesBodyLimitBytes, ct);
        if (body is null)
        {
            return TypedResults.Problem(
                title: "Request body too large",
                detail: $"The body is over this route's limit of {OutcomesBodyLimitBytes:N0} bytes; split it into requests of at most {MaxRowsPerRequest:N0} rows. Nothing was stored.",
                statusCode: StatusCodes.Status413PayloadTooLarge);
        }

        var others = (await db.Scorecards.AsNoTracking().Where(s => s.Id != scorecard.Id).Select(s => new { s.Id, s.Key }).ToListAsync(ct))
            .Where(s => Actor.MayUseScorecard(user, s.Key))
            .ToDictionary(s => s.Id, s => s.Key);
        var now = clock.GetUtcNow();
        var today = DateOnly.FromDateTime(now.UtcDateTime);
        var isAtomic = atomic ?? false;

        await using var transaction = await db.Database.BeginTransactionAsync(ct);
        await using var store = OutcomeStore.Create(db);
        var ingestion = new OutcomeIngestion(db, store, scorecard, others, isAtomic, today, now);
        using IOutcomeRowReader reader = format == "csv"
            ? new OutcomeCsvReader(body.Content, MaxRowsPerRequest)
            : new OutcomeJsonReader(body.Content, MaxRowsPerRequest);
        var rows = new List<OutcomeRow>(ChunkRows);
        bool more;
        do
        {
            rows.Clear();
            more = await reader.ReadAsync(rows, ChunkRows, ct);
            if (reader.Problem is not null)
            {
                return TypedResults.Problem(title: "The body cannot be read", detail: reader.Problem, statusCode: StatusCodes.Status400BadRequest);
            }

            await ingestion.ProcessAsync(rows, ct);
        }
        while (more);

        if (isAtomic && ingestion.Rejected.Count > 0)
        {
            var first = ingestion.Rejected[0];
            return TypedResults.Problem(
                title: "No outcome was stored",
                detail: $"{ingestion.Rejected.Count:N0} row{(ingestion.Rejected.Count == 1 ? " is" : "s are")} not valid (the first, row {first.Index}: {first.Error}); with atomic=true one bad row stores nothing. Every bad row is listed under 'rejected'.",
                statusCode: StatusCodes.Status400BadRequest,
                extensions: new Dictionary<string, object?> { ["accepted"] = 0, ["rejected"] = ingestion.Rejected });
        }

        if (ingestion.Accepted > 0)
        {
            db.Record(Actor.Of(user), "outcomes.recorded", $"{key}/outcomes",
                new { accepted = ingestion.Accepted, rejected = ingestion.Rejected.Count, format, atomic = isAtomic, bodyBytes = body.Bytes, bodySha256 = body.Sha256 },
                now);
            await db.SaveChangesAsync(ct);
        }

        await transaction.CommitAsync(ct);
        return TypedResults.Ok(new RecordOutcomesResponse(ingestion.Accepted, ingestion.Rejected));
    }

    /// <summary>Per deciding version and role: how many decisions have outcomes, how many matured, and when the next can.</summary>
    public static async Task<Results<Ok<MaturityResponse>, ProblemHttpResult>> GetMaturity(string key, LedgerlineDbContext db, TimeProvider clock, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var today = DateOnly.FromDateTime(clock.GetUtcNow().UtcDateTime);
        return TypedResults.Ok(await MaturityQuery.RunAsync(db, scorecard, today, ct));
    }

    private static string? FormatOf(string? contentType)
    {
        if (!MediaTypeHeaderValue.TryParse(contentType, out var media))
        {
            return null;
        }

        var type = media.MediaType.Value ?? string.Empty;
        if (type.Equals("text/csv", StringComparison.OrdinalIgnoreCase))
        {
            return "csv";
        }

        return type.Equals("application/json", StringComparison.OrdinalIgnoreCase) || type.EndsWith("+json", StringComparison.OrdinalIgnoreCase)
            ? "json"
            : null;
    }
}
