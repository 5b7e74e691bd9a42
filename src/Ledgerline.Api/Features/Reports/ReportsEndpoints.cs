using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Http;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Ledgerline.Api.Features.Reports;

public static class ReportsEndpoints
{
    public static IEndpointRouteBuilder MapReports(this IEndpointRouteBuilder routes)
    {
        // Analysts and risk managers read reports; every report also answers text/csv for spreadsheets.
        var group = routes.MapGroup("/scorecards/{key}/reports").WithTags("Reports").ForScorecardRoutes();
        group.MapGet("/performance", GetPerformance).AllowRoles(Roles.Analyst, Roles.Risk);
        group.MapGet("/comparison", GetComparison).AllowRoles(Roles.Analyst, Roles.Risk);
        group.MapGet("/stability", GetStability).AllowRoles(Roles.Analyst, Roles.Risk);
        return routes;
    }

    public static Task<Results<Ok<PerformanceReport>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> GetPerformance(
        [AsParameters] ReportParameters parameters, HttpRequest request, LedgerlineDbContext db, ReportBuilder reports, CancellationToken ct) =>
        RunAsync(parameters, request, db, reports, ReportCsv.Performance, (context, ct) => reports.PerformanceAsync(context.Scorecard, context.Versions, context.Query, ct), ct);

    public static Task<Results<Ok<ComparisonReport>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> GetComparison(
        [AsParameters] ReportParameters parameters, HttpRequest request, LedgerlineDbContext db, ReportBuilder reports, CancellationToken ct) =>
        RunAsync(parameters, request, db, reports, ReportCsv.Comparison, (context, ct) => reports.ComparisonAsync(context.Scorecard, context.Versions, context.Query, ct), ct);

    /// <param name="parameters"></param>
    /// <param name="period"><c>month</c> (default) or <c>week</c>.</param>
    /// <param name="request"></param>
    /// <param name="db"></param>
    /// <param name="reports"></param>
    /// <param name="ct"></param>
    public static Task<Results<Ok<StabilityReport>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> GetStability(
        [AsParameters] ReportParameters parameters, string? period, HttpRequest request, LedgerlineDbContext db, ReportBuilder reports, CancellationToken ct) =>
        RunAsync(parameters, request, db, reports, ReportCsv.Stability,
            (context, ct) => reports.StabilityAsync(context.Scorecard, context.Versions[context.Query.Version!.Value], context.Query, ct), ct,
            period: period, requiresVersion: "give the version whose stability to report, e.g. ?version=2");

    /// <summary>
    /// The pipeline every report shares: parse and check the parameters, find the scorecard and its
    /// versions (404 naming what is missing), build the report, and answer JSON or, when asked, CSV.
    /// </summary>
    private static async Task<Results<Ok<TReport>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> RunAsync<TReport>(
        ReportParameters parameters,
        HttpRequest request,
        LedgerlineDbContext db,
        ReportBuilder reports,
        Func<TReport, string> csv,
        Func<ReportContext, CancellationToken, Task<TReport>> build,
        CancellationToken ct,
        string? period = null,
        string? requiresVersion = null)
    {
        var (query, problem) = ReportQuery.Parse(parameters.Version, parameters.From, parameters.To, period);
        if (problem is not null)
        {
            return problem;
        }

        if (requiresVersion is not null && query!.Version is null)
        {
            return Problems.Invalid("version", requiresVersion);
        }

        var scorecard = await ScorecardLookup.FindAsync(db, parameters.Key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(parameters.Key);
        }

        var versions = await reports.VersionsAsync(scorecard, ct);
        if (query!.Version is { } n && !versions.ContainsKey(n))
        {
            return ScorecardLookup.VersionNotFound(parameters.Key, n);
        }

        var report = await build(new ReportContext(scorecard, versions, query), ct);
        return WantsCsv(request) ? TypedResults.Text(csv(report), ReportCsv.MediaType) : TypedResults.Ok(report);
    }

    private static bool WantsCsv(HttpRequest request) =>
        request.GetTypedHeaders().Accept.Any(a => a.MediaType.Equals(ReportCsv.MediaType, StringComparison.OrdinalIgnoreCase));
}

/// <summary>What a report is built from once its parameters are checked.</summary>
public sealed record ReportContext(Scorecard Scorecard, IReadOnlyDictionary<int, ReportVersion> Versions, ReportQuery Query);
