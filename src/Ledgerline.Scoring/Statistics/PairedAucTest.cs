namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// DeLong's test of two correlated AUCs (both versions scored the same applications).
/// Null values come with a <see cref="Reason"/>; no NaN is returned.
/// </summary>
/// <param name="Goods">Number of goods.</param>
/// <param name="Bads">Number of bads.</param>
/// <param name="AucA">AUC of version A; null without both classes.</param>
/// <param name="AucB">AUC of version B; null without both classes.</param>
/// <param name="VarianceA">DeLong variance of AUC A; null with fewer than two goods or two bads.</param>
/// <param name="VarianceB">DeLong variance of AUC B; null as <paramref name="VarianceA"/>.</param>
/// <param name="Covariance">DeLong covariance of AUC A and AUC B; null as <paramref name="VarianceA"/>.</param>
/// <param name="Difference">AUC A − AUC B; null without both classes.</param>
/// <param name="Z">Difference / √(VarA + VarB − 2·Cov); null when that variance is zero (for example a version compared with itself).</param>
/// <param name="PValue">Two-sided p-value 2·Φ(−|Z|); null when <paramref name="Z"/> is.</param>
/// <param name="DifferenceConfidenceInterval">95% interval of the difference, Difference ± z₀.₉₇₅·SE; null when <paramref name="Z"/> is.</param>
/// <param name="Reason">Why a value is null; null when every value is present.</param>
public sealed record PairedAucTest(
    long Goods,
    long Bads,
    double? AucA,
    double? AucB,
    double? VarianceA,
    double? VarianceB,
    double? Covariance,
    double? Difference,
    double? Z,
    double? PValue,
    ConfidenceInterval? DifferenceConfidenceInterval,
    string? Reason)
{
    /// <summary>Number of applications (goods plus bads).</summary>
    public long Total => Goods + Bads;
}
