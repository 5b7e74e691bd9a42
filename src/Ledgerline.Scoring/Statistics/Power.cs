namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Sample sizes and minimum detectable differences for champion/challenger comparisons, two-sided
/// tests. Sizes count matured accounts per arm, not applications.
/// </summary>
public static class Power
{
    /// <summary>
    /// Matured accounts per arm needed to detect bad rates p₁ vs p₂ (Fleiss, "Statistical Methods for
    /// Rates and Proportions", Wiley, 1981): n = [z_{1−α/2}·√(2p̄(1 − p̄)) + z_{1−β}·√(p₁(1 − p₁) +
    /// p₂(1 − p₂))]² / (p₁ − p₂)², and n' = (n/4)·(1 + √(1 + 4/(n·|p₁ − p₂|)))² (Fleiss, Tytun &amp; Ury,
    /// Biometrics, 1980).
    /// </summary>
    /// <param name="p1">Bad rate of arm 1, in (0, 1).</param>
    /// <param name="p2">Bad rate of arm 2, in (0, 1), different from <paramref name="p1"/>.</param>
    /// <param name="alpha">Two-sided significance level, 0.05 by default.</param>
    /// <param name="power">Power, 0.80 by default.</param>
    /// <returns>The sample size per arm, without and with continuity correction.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range or p₁ = p₂.</exception>
    public static SampleSize TwoProportionsSampleSize(double p1, double p2, double alpha = 0.05, double power = 0.80)
    {
        CheckProbability(p1, nameof(p1));
        CheckProbability(p2, nameof(p2));
        CheckLevels(alpha, power);
        if (p1 == p2)
        {
            throw new ArgumentOutOfRangeException(nameof(p2), "The two bad rates must differ.");
        }

        var n = FleissN(p1, p2, alpha, power);
        var delta = Math.Abs(p1 - p2);
        var root = 1 + Math.Sqrt(1 + (4 / (n * delta)));
        return new SampleSize(n, n / 4 * root * root);
    }

    /// <summary>
    /// Hanley–McNeil standard error of an AUC (Hanley &amp; McNeil, "The meaning and use of the area
    /// under a receiver operating characteristic (ROC) curve", Radiology, 1982): SE² = [A(1 − A) +
    /// (n_B − 1)(Q₁ − A²) + (n_G − 1)(Q₂ − A²)] / (n_B·n_G), Q₁ = A/(2 − A), Q₂ = 2A²/(1 + A).
    /// </summary>
    /// <param name="auc">AUC in (0, 1).</param>
    /// <param name="bads">Number of bads, &gt; 0 (may be fractional in planning).</param>
    /// <param name="goods">Number of goods, &gt; 0.</param>
    /// <returns>The standard error.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range.</exception>
    public static double HanleyMcNeilStandardError(double auc, double bads, double goods)
    {
        CheckProbability(auc, nameof(auc));
        if (!(bads > 0) || !(goods > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(bads), "Goods and bads must be positive.");
        }

        var q1 = auc / (2 - auc);
        var q2 = 2 * auc * auc / (1 + auc);
        var variance = ((auc * (1 - auc)) + ((bads - 1) * (q1 - (auc * auc))) + ((goods - 1) * (q2 - (auc * auc)))) / (bads * goods);
        return Math.Sqrt(variance);
    }

    /// <summary>
    /// Matured accounts per arm needed to detect AUC₁ vs AUC₂ between independent arms at the given bad
    /// rate: the smallest whole n with |AUC₂ − AUC₁| / √(SE²(AUC₁) + SE²(AUC₂)) ≥ z_{1−α/2} + z_{1−β},
    /// SEs by Hanley–McNeil with n·badRate bads and n·(1 − badRate) goods. Paired (shadow-scored)
    /// comparisons need fewer accounts.
    /// </summary>
    /// <param name="auc1">AUC of arm 1, in (0, 1).</param>
    /// <param name="auc2">AUC of arm 2, in (0, 1), different from <paramref name="auc1"/>.</param>
    /// <param name="badRate">Expected bad rate of matured accounts, in (0, 1).</param>
    /// <param name="alpha">Two-sided significance level, 0.05 by default.</param>
    /// <param name="power">Power, 0.80 by default.</param>
    /// <returns>Accounts per arm, rounded up.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range or the AUCs are equal.</exception>
    public static long AucDifferenceSampleSize(double auc1, double auc2, double badRate, double alpha = 0.05, double power = 0.80)
    {
        CheckProbability(auc1, nameof(auc1));
        CheckProbability(auc2, nameof(auc2));
        CheckProbability(badRate, nameof(badRate));
        CheckLevels(alpha, power);
        if (auc1 == auc2)
        {
            throw new ArgumentOutOfRangeException(nameof(auc2), "The two AUCs must differ.");
        }

        var required = StandardNormal.Quantile(1 - (alpha / 2)) + StandardNormal.Quantile(power);
        bool Enough(double n) => AucSeparation(auc1, auc2, badRate, n) >= required;

        // The separation grows with n; find an upper bound by doubling, then bisect on whole numbers.
        long high = 4;
        while (!Enough(high))
        {
            high *= 2;
            if (high > 1L << 50)
            {
                throw new ArgumentOutOfRangeException(nameof(auc2), "The difference is too small to detect with any sample.");
            }
        }

        long low = high / 2;
        while (high - low > 1)
        {
            var middle = low + ((high - low) / 2);
            if (Enough(middle))
            {
                high = middle;
            }
            else
            {
                low = middle;
            }
        }

        return high;
    }

    /// <summary>
    /// The smallest increase over bad rate <paramref name="p1"/> detectable with <paramref name="perArm"/>
    /// matured accounts per arm (Fleiss n solved for p₂ &gt; p₁ by bisection).
    /// </summary>
    /// <param name="p1">Baseline bad rate, in (0, 1).</param>
    /// <param name="perArm">Matured accounts per arm, &gt; 0.</param>
    /// <param name="alpha">Two-sided significance level, 0.05 by default.</param>
    /// <param name="power">Power, 0.80 by default.</param>
    /// <returns>p₂ − p₁; null when even p₂ close to 1 is not detectable with this sample.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range.</exception>
    public static double? MinimumDetectableBadRateDifference(double p1, double perArm, double alpha = 0.05, double power = 0.80)
    {
        CheckProbability(p1, nameof(p1));
        CheckLevels(alpha, power);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(perArm);
        return Bisect(delta => FleissN(p1, p1 + delta, alpha, power) <= perArm, 1 - p1);
    }

    /// <summary>
    /// The smallest AUC improvement over <paramref name="auc1"/> detectable between independent arms of
    /// <paramref name="perArm"/> matured accounts each (Hanley–McNeil SEs, solved by bisection).
    /// </summary>
    /// <param name="auc1">Baseline AUC, in (0, 1).</param>
    /// <param name="perArm">Matured accounts per arm, &gt; 0.</param>
    /// <param name="badRate">Expected bad rate, in (0, 1).</param>
    /// <param name="alpha">Two-sided significance level, 0.05 by default.</param>
    /// <param name="power">Power, 0.80 by default.</param>
    /// <returns>AUC₂ − AUC₁; null when even AUC₂ close to 1 is not detectable with this sample.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range.</exception>
    public static double? MinimumDetectableAucDifference(double auc1, double perArm, double badRate, double alpha = 0.05, double power = 0.80)
    {
        CheckProbability(auc1, nameof(auc1));
        CheckProbability(badRate, nameof(badRate));
        CheckLevels(alpha, power);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(perArm);
        var required = StandardNormal.Quantile(1 - (alpha / 2)) + StandardNormal.Quantile(power);
        return Bisect(delta => AucSeparation(auc1, auc1 + delta, badRate, perArm) >= required, 1 - auc1);
    }

    private static double FleissN(double p1, double p2, double alpha, double power)
    {
        var zAlpha = StandardNormal.Quantile(1 - (alpha / 2));
        var zBeta = StandardNormal.Quantile(power);
        var mean = (p1 + p2) / 2;
        var term = (zAlpha * Math.Sqrt(2 * mean * (1 - mean))) + (zBeta * Math.Sqrt((p1 * (1 - p1)) + (p2 * (1 - p2))));
        return term * term / ((p1 - p2) * (p1 - p2));
    }

    private static double AucSeparation(double auc1, double auc2, double badRate, double n)
    {
        var bads = n * badRate;
        var goods = n * (1 - badRate);
        var se1 = HanleyMcNeilStandardError(auc1, bads, goods);
        var se2 = HanleyMcNeilStandardError(auc2, bads, goods);
        return Math.Abs(auc2 - auc1) / Math.Sqrt((se1 * se1) + (se2 * se2));
    }

    /// <summary>Smallest delta in (0, limit) with detectable(delta) true, assuming monotonicity; null if none.</summary>
    private static double? Bisect(Func<double, bool> detectable, double limit)
    {
        var high = limit * (1 - 1e-9);
        if (!detectable(high))
        {
            return null;
        }

        double low = 0;
        for (var i = 0; i < 200 && high - low > 1e-12; i++)
        {
            var middle = (low + high) / 2;
            if (detectable(middle))
            {
                high = middle;
            }
            else
            {
                low = middle;
            }
        }

        return high;
    }

    private static void CheckProbability(double value, string name)
    {
        if (!(value is > 0 and < 1))
        {
            throw new ArgumentOutOfRangeException(name, "The value must lie strictly between 0 and 1.");
        }
    }

    private static void CheckLevels(double alpha, double power)
    {
        CheckProbability(alpha, nameof(alpha));
        CheckProbability(power, nameof(power));
    }
}
