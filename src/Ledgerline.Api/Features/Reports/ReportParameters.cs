using Microsoft.AspNetCore.Mvc;

namespace Ledgerline.Api.Features.Reports;

/// <summary>The route and query parameters every report takes, bound as one argument.</summary>
/// <param name="Key">The scorecard's key.</param>
/// <param name="Version">The version to report on (required by stability); every version when left out.</param>
/// <param name="From">First application date, yyyy-MM-dd.</param>
/// <param name="To">Last application date, yyyy-MM-dd.</param>
public sealed record ReportParameters(
    [FromRoute(Name = "key")] string Key,
    [FromQuery(Name = "version")] string? Version,
    [FromQuery(Name = "from")] string? From,
    [FromQuery(Name = "to")] string? To);
