using Ledgerline.Scoring.Statistics;
using MathNet.Numerics.Distributions;

namespace Ledgerline.Scoring.Monitoring;

/// <summary>
/// Test of the decline of a version's AUC against its development AUC: S = (AUC_dev − AUC_now) / s_now,
/// one-sided p = 1 − Φ(S), s_now the DeLong standard error of the current AUC (European Central Bank,
/// "Instructions for reporting the validation results of internal models", 2019, §2.5.4.1).
/// </summary>
public static class AucDecline
{
    /// <summary>Tests whether the current AUC is significantly below the development AUC.</summary>
    /// <param name="developmentAuc">AUC on the development sample, in [0, 1].</param>
    /// <param name="current">The current curve, from <see cref="Roc.Compute(ScoreHistogram)"/>.</param>
    /// <returns>The statistic and p-value; null with a reason when the current AUC or its variance is missing or the variance is zero.</returns>
    public static AucDeclineTest Test(double developmentAuc, RocResult current)
    {
        if (current.Auc is not { } auc)
        {
            return new AucDeclineTest(developmentAuc, null, null, null, null, current.Reason ?? "The current AUC is undefined.");
        }

        var decline = developmentAuc - auc;
        if (current.Variance is not { } variance || variance <= 0)
        {
            return new AucDeclineTest(developmentAuc, auc, decline, null, null,
                current.Reason ?? "The current AUC has zero variance, so the decline cannot be tested.");
        }

        var s = decline / Math.Sqrt(variance);
        return new AucDeclineTest(developmentAuc, auc, decline, s, Normal.CDF(0, 1, -s), null);
    }
}

/// <summary>Result of <see cref="AucDecline.Test"/>; null values come with a <see cref="Reason"/>.</summary>
/// <param name="DevelopmentAuc">AUC on the development sample.</param>
/// <param name="CurrentAuc">AUC now; null when undefined.</param>
/// <param name="Decline">Development AUC − current AUC (positive: worse now); null with <paramref name="CurrentAuc"/>.</param>
/// <param name="Statistic">S = decline / s_now; null when s_now is missing or zero.</param>
/// <param name="PValue">One-sided p = 1 − Φ(S): small when the AUC fell significantly.</param>
/// <param name="Reason">Why values are null; null otherwise.</param>
public sealed record AucDeclineTest(double DevelopmentAuc, double? CurrentAuc, double? Decline, double? Statistic, double? PValue, string? Reason);
