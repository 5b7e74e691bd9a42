namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Test of two AUCs from independent samples, as pROC 1.18.0 <c>roc.test(paired = FALSE,
/// method = "delong")</c>: a Student t statistic with Welch-type degrees of freedom.
/// Null values come with a <see cref="Reason"/>; no NaN is returned.
/// </summary>
/// <param name="AucA">AUC of the first curve; null if it has none.</param>
/// <param name="AucB">AUC of the second curve; null if it has none.</param>
/// <param name="Difference">AUC A − AUC B; null if either AUC is missing.</param>
/// <param name="Statistic">D = Difference / √(VarA + VarB); null if either variance is missing or both are zero.</param>
/// <param name="DegreesOfFreedom">(VarA + VarB)² / (VarA²/(NA − 1) + VarB²/(NB − 1)), N = goods + bads of that curve.</param>
/// <param name="PValue">Two-sided p-value 2·P(T_df &gt; |D|).</param>
/// <param name="Reason">Why a value is null; null when every value is present.</param>
public sealed record UnpairedAucTest(
    double? AucA,
    double? AucB,
    double? Difference,
    double? Statistic,
    double? DegreesOfFreedom,
    double? PValue,
    string? Reason);
