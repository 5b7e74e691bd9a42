using System.Globalization;

namespace Ledgerline.Api.Features.Overview;

/// <summary>How numbers read on the page: invariant culture, a dash where a figure is undefined.</summary>
public static class Figures
{
    public const string None = "—";

    public static string Number(double? value, int decimals = 3) =>
        value is { } v ? v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : None;

    public static string Percent(double? value, int decimals = 1) =>
        value is { } v ? (v * 100).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + "%" : None;

    public static string Count(long value) => value.ToString("N0", CultureInfo.InvariantCulture);

    public static string Score(decimal? value) => value is { } v ? v.ToString("0.####", CultureInfo.InvariantCulture) : None;

    public static string Score(double value) => value.ToString("0.####", CultureInfo.InvariantCulture);

    /// <summary>Labels of right-closed score bins by their upper edges: "≤560" up to the last, which reads ">640".</summary>
    public static IReadOnlyList<string> BinLabels(IReadOnlyList<decimal?> upperEdges) =>
        upperEdges.Select((top, i) => top is { } t ? $"≤{Score(t)}" : i > 0 ? $">{Score(upperEdges[i - 1])}" : "all").ToList();
}
