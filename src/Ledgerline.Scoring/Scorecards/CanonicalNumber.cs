using System.Globalization;

namespace Ledgerline.Scoring.Scorecards;

/// <summary>Formats decimals in one canonical way: invariant culture, no trailing zeros, no exponent.</summary>
public static class CanonicalNumber
{
    /// <summary>Removes trailing zeros, so 38, 38.0 and 38.00 all read "38".</summary>
    public static decimal Normalize(decimal value) => value / 1.000000000000000000000000000000000m;

    /// <summary>The canonical text of a decimal, e.g. "603", "-1.25".</summary>
    public static string Format(decimal value) => Normalize(value).ToString(CultureInfo.InvariantCulture);
}
