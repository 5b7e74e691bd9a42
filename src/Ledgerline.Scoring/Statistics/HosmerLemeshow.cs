using MathNet.Numerics;

namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Hosmer–Lemeshow goodness-of-fit test over groups (Hosmer &amp; Lemeshow, "Goodness of fit tests for
/// the multiple logistic regression model", Communications in Statistics, 1980).
/// </summary>
public static class HosmerLemeshow
{
    /// <summary>Computes HL = Σ_g (D_g − E_g)² / (E_g·(1 − p̄_g)) and its chi-square p-value.</summary>
    /// <param name="groups">Groups with count, bads and expected bads.</param>
    /// <param name="degreesOfFreedom">
    /// Chosen by the caller: G − 2 on the development sample; practitioners often use G on an
    /// independent monitoring sample. Reports should state which.
    /// </param>
    /// <returns>
    /// The result. Empty groups are skipped. A group whose mean PD is 0 or 1 makes the statistic
    /// undefined: null with a reason.
    /// </returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="degreesOfFreedom"/> is below 1.</exception>
    public static HosmerLemeshowResult Compute(IEnumerable<CalibrationCell> groups, int degreesOfFreedom)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(degreesOfFreedom, 1);
        double statistic = 0;
        var used = 0;
        foreach (var cell in groups)
        {
            if (cell.Count == 0)
            {
                continue;
            }

            used++;
            var meanPd = cell.ExpectedBads / cell.Count;
            if (!(meanPd is > 0 and < 1))
            {
                return new HosmerLemeshowResult(null, degreesOfFreedom, null, used,
                    "A group has mean PD 0 or 1, so its term divides by zero.");
            }

            var gap = cell.Bads - cell.ExpectedBads;
            statistic += gap * gap / (cell.ExpectedBads * (1 - meanPd));
        }

        if (used == 0)
        {
            return new HosmerLemeshowResult(null, degreesOfFreedom, null, 0, "No decisions in any group.");
        }

        // The upper tail Q(df/2, x/2) directly, not 1 − CDF, so p-values like 1e-109 keep their digits.
        var p = SpecialFunctions.GammaUpperRegularized(degreesOfFreedom / 2.0, statistic / 2);
        return new HosmerLemeshowResult(statistic, degreesOfFreedom, p, used, null);
    }
}
