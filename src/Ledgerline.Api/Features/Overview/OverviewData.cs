using Ledgerline.Api.Features.Alerts;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Api.Features.Overview;

/// <summary>Everything the overview page shows, gathered before any markup is written.</summary>
public sealed record OverviewData(
    string Key,
    string Name,
    DateOnly AsOf,
    int PerformanceWindowMonths,
    IReadOnlyList<ShownVersion> Versions,
    PerformanceReport Performance,
    ComparisonReport Comparison,
    IReadOnlyDictionary<int, StabilityReport> Stability,
    IReadOnlyList<AlertResponse> Alerts,
    IReadOnlyList<CohortMaturity> Cohorts,
    IReadOnlyDictionary<int, IReadOnlyList<double>> BaselineShares);

/// <summary>A version on the page, in plan order (champion, challengers, shadows), with its curves.</summary>
public sealed record ShownVersion(int Number, string Role, double? Share, string Colour, RocResult Roc, KolmogorovSmirnovResult Ks)
{
    public string Label => $"v{Number} {Role}";
}
