using Ledgerline.Api.Data;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Api.Features.Scorecards;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Ledgerline.Api.Features.Overview;

public static class OverviewEndpoints
{
    public const string HtmlMediaType = "text/html";

    // Nothing but the page itself and its inline styles may load: a closed network has nothing else to offer.
    private const string ContentSecurityPolicy = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'; frame-ancestors 'none'";

    public static IEndpointRouteBuilder MapOverview(this IEndpointRouteBuilder routes)
    {
        // The overview is a page for people: risk managers and analysts read it in a browser or print it.
        routes.MapGroup("/scorecards/{key}/reports").WithTags("Reports").ForScorecardRoutes()
            .MapGet("/overview", GetOverview).AllowRoles(Roles.Analyst, Roles.Risk).Produces(StatusCodes.Status200OK, contentType: HtmlMediaType);
        return routes;
    }

    public static async Task<Results<RazorComponentResult<OverviewPage>, ValidationProblem, ProblemHttpResult>> GetOverview(
        string key, string? from, string? to, HttpContext context, LedgerlineDbContext db, ReportBuilder reports, TimeProvider clock, CancellationToken ct)
    {
        if (!AcceptsHtml(context.Request))
        {
            return TypedResults.Problem(statusCode: StatusCodes.Status406NotAcceptable, title: "Not acceptable",
                detail: $"The overview is an HTML page; ask for {HtmlMediaType} (a browser does). The same figures as JSON or CSV are at /scorecards/{key}/reports/performance, /comparison and /stability.");
        }

        var (query, problem) = ReportQuery.Parse(null, from, to, null);
        if (problem is not null)
        {
            return problem;
        }

        var scorecard = await ScorecardLookup.FindAsync(db, key, ct);
        if (scorecard is null)
        {
            return ScorecardLookup.NotFound(key);
        }

        var data = await new OverviewBuilder(db, reports, clock).BuildAsync(scorecard, query!, ct);
        context.Response.Headers.ContentSecurityPolicy = ContentSecurityPolicy;
        context.Response.Headers.CacheControl = "no-store";
        // Razor components escape every value by default; only the SVG fragments are passed as markup.
        return new RazorComponentResult<OverviewPage>(new Dictionary<string, object?> { [nameof(OverviewPage.Data)] = data })
        {
            ContentType = HtmlMediaType + "; charset=utf-8",
        };
    }

    /// <summary>HTML when the client names it, or takes anything (curl's default); a JSON-only client is told where the JSON is.</summary>
    private static bool AcceptsHtml(HttpRequest request)
    {
        var accept = request.GetTypedHeaders().Accept;
        return accept.Count == 0 || accept.Any(a => a.MediaType.Equals(HtmlMediaType, StringComparison.OrdinalIgnoreCase)
            || a.MediaType.Equals("*/*", StringComparison.Ordinal) || a.MediaType.Equals("text/*", StringComparison.OrdinalIgnoreCase));
    }
}
