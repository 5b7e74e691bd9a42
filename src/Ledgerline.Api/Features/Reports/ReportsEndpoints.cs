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

        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var versions = await reports.VersionsAsync(scorecard, ct);
        if (query!.Version is { } n && !versions.ContainsKey(n))
        {
            return ScorecardLookup.VersionNotFound(key, n);
        }

        var report = await reports.PerformanceAsync(scorecard, versions, query, ct);
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

        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var versions = await reports.VersionsAsync(scorecard, ct);
        if (query!.Version is { } n && !versions.ContainsKey(n))
        {
            return ScorecardLookup.VersionNotFound(key, n);
        }

        var report = await reports.ComparisonAsync(scorecard, versions, query, ct);
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

        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var versions = await reports.VersionsAsync(scorecard, ct);
        if (!versions.TryGetValue(query.Version.Value, out var found))
        {
            return ScorecardLookup.VersionNotFound(key, query.Version.Value);
        }

        var report = await reports.StabilityAsync(scorecard, found, query, ct);
        return WantsCsv(request) ? TypedResults.Text(ReportCsv.Stability(report), ReportCsv.MediaType) : TypedResults.Ok(report);
    }

    private static bool WantsCsv(HttpRequest request) =>
        request.GetTypedHeaders().Accept.Any(a => a.MediaType.Equals(ReportCsv.MediaType, StringComparison.OrdinalIgnoreCase));
}
