namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Discrimination of one score: AUC, Gini and DeLong variance with its 95% confidence interval.
/// Values that cannot be computed are null and <see cref="Reason"/> says why; no NaN is returned.
/// </summary>
/// <param name="Goods">Number of goods.</param>
/// <param name="Bads">Number of bads.</param>
/// <param name="Auc">P(score of a good &gt; score of a bad) + ½·P(tie); null without both classes.</param>
/// <param name="Gini">2·AUC − 1 (accuracy ratio); null when <paramref name="Auc"/> is.</param>
/// <param name="Variance">DeLong variance of the AUC; null with fewer than two goods or two bads.</param>
/// <param name="ConfidenceInterval">AUC ± z₀.₉₇₅·√variance, clipped to [0, 1]; null when the variance is.</param>
/// <param name="Points">ROC curve from the origin to (1, 1), one point per distinct score; empty without both classes.</param>
/// <param name="Reason">Why a value is null; null when every value is present.</param>
public sealed record RocResult(
    long Goods,
    long Bads,
    double? Auc,
    double? Gini,
    double? Variance,
    ConfidenceInterval? ConfidenceInterval,
    IReadOnlyList<RocPoint> Points,
    string? Reason)
{
    /// <summary>Goods plus bads.</summary>
    public long Total => Goods + Bads;

    /// <summary>√variance; null when the variance is.</summary>
    public double? StandardError => Variance is { } variance ? Math.Sqrt(variance) : null;
}
