using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Alerts;
using Ledgerline.Api.Features.Scorecards;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Ledgerline.Api.Features.Reports;

public static class ReportsEndpoints
{
    public static IServiceCollection AddReports(this IServiceCollection services)
    {
        services.AddScoped<ReportBuilder>();
        return services.AddAlerts();
    }

    public static IEndpointRouteBuilder MapReports(this IEndpointRouteBuilder routes)
    {
        // Analysts and risk managers read reports; every report also answers text/csv for spreadsheets.
        var group = routes.MapGroup("/scorecards/{key}/reports").WithTags("Reports").ForScorecardRoutes();
        group.MapGet("/performance", GetPerformance).AllowRoles(Roles.Analyst, Roles.Risk);
        group.MapGet("/comparison", GetComparison).AllowRoles(Roles.Analyst, Roles.Risk);
        group.MapGet("/stability", GetStability).AllowRoles(Roles.Analyst, Roles.Risk);
        return routes.MapAlerts();
    }

    public static async Task<Results<Ok<PerformanceReport>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> GetPerformance(
        string key, string? version, string? from, string? to, HttpRequest request, LedgerlineDbContext db, ReportBuilder reports, CancellationToken ct)
    {
        var (query, problem) = ReportQuery.Parse(version, from, to, null);
        if (problem is not null)
        {
            return problem;
        }

        var (scorecard, versions, missing) = await ResolveAsync(key, query!, db, reports, ct);
        if (missing is not null)
        {
            return missing;
        }

        var report = await reports.PerformanceAsync(scorecard!, versions!, query!, ct);
        return WantsCsv(request) ? TypedResults.Text(ReportCsv.Performance(report), ReportCsv.MediaType) : TypedResults.Ok(report);
    }

    public static async Task<Results<Ok<ComparisonReport>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> GetComparison(
        string key, string? version, string? from, string? to, HttpRequest request, LedgerlineDbContext db, ReportBuilder reports, CancellationToken ct)
    {
        var (query, problem) = ReportQuery.Parse(version, from, to, null);
        if (problem is not null)
        {
            return problem;
        }

        var (scorecard, versions, missing) = await ResolveAsync(key, query!, db, reports, ct);
        if (missing is not null)
        {
            return missing;
        }

        var report = await reports.ComparisonAsync(scorecard!, versions!, query!, ct);
        return WantsCsv(request) ? TypedResults.Text(ReportCsv.Comparison(report), ReportCsv.MediaType) : TypedResults.Ok(report);
    }

    public static async Task<Results<Ok<StabilityReport>, ContentHttpResult, ValidationProblem, ProblemHttpResult>> GetStability(
        string key, string? version, string? from, string? to, string? period, HttpRequest request, LedgerlineDbContext db, ReportBuilder reports, CancellationToken ct)
    {
        var (query, problem) = ReportQuery.Parse(version, from, to, period);
        if (problem is not null)
        {
            return problem;
        }

        if (query!.Version is null)
        {
            return Http.Problems.Invalid("version", "give the version whose stability to report, e.g. ?version=2");
        }

        var (scorecard, versions, missing) = await ResolveAsync(key, query, db, reports, ct);
        if (missing is not null)
        {
            return missing;
        }

        var report = await reports.StabilityAsync(scorecard!, versions![query.Version.Value], query, ct);
        return WantsCsv(request) ? TypedResults.Text(ReportCsv.Stability(report), ReportCsv.MediaType) : TypedResults.Ok(report);
    }

    /// <summary>The scorecard and its versions, or the 404 naming the missing scorecard or queried version.</summary>
    private static async Task<(Scorecard? Scorecard, Dictionary<int, ReportVersion>? Versions, ProblemHttpResult? Missing)> ResolveAsync(
        string key, ReportQuery query, LedgerlineDbContext db, ReportBuilder reports, CancellationToken ct)
    {
        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return (null, null, ScorecardLookup.NotFound(key));
        }

        var versions = await reports.VersionsAsync(scorecard, ct);
        return query.Version is { } n && !versions.ContainsKey(n)
            ? (null, null, ScorecardLookup.VersionNotFound(key, n))
            : (scorecard, versions, null);
    }

    private static bool WantsCsv(HttpRequest request) =>
        request.GetTypedHeaders().Accept.Any(a => a.MediaType.Equals(ReportCsv.MediaType, StringComparison.OrdinalIgnoreCase));
}
