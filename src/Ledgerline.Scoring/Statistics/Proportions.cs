using MathNet.Numerics;

namespace Ledgerline.Scoring.Statistics;

/// <summary>Tests on proportions and counts for champion/challenger arms.</summary>
public static class Proportions
{
    /// <summary>
    /// Pooled two-proportion z-test, two-sided (common practice; equivalent to Pearson's chi-square
    /// test of the 2×2 table without continuity correction, z² = χ²).
    /// </summary>
    /// <param name="successes1">Successes in group 1, 0 ≤ s₁ ≤ n₁.</param>
    /// <param name="n1">Size of group 1, ≥ 0.</param>
    /// <param name="successes2">Successes in group 2, 0 ≤ s₂ ≤ n₂.</param>
    /// <param name="n2">Size of group 2, ≥ 0.</param>
    /// <returns>
    /// The test. An empty group: proportions of that group and all statistics null with a reason.
    /// All successes or no successes in both groups: z and p null with a reason (zero variance).
    /// </returns>
    /// <exception cref="ArgumentOutOfRangeException">A count is negative or successes exceed the group size.</exception>
    public static TwoProportionTest TwoProportionZTest(long successes1, long n1, long successes2, long n2)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(successes1);
        ArgumentOutOfRangeException.ThrowIfNegative(successes2);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(successes1, n1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(successes2, n2);
        double? p1 = n1 > 0 ? (double)successes1 / n1 : null;
        double? p2 = n2 > 0 ? (double)successes2 / n2 : null;
        if (p1 is not { } first || p2 is not { } second)
        {
            return new TwoProportionTest(p1, p2, null, null, null, null, "Both groups need at least one decision.");
        }

        var difference = first - second;
        var unpooled = Math.Sqrt((first * (1 - first) / n1) + (second * (1 - second) / n2));
        var halfWidth = StandardNormal.TwoSidedCritical(0.95) * unpooled;
        var interval = new ConfidenceInterval(difference - halfWidth, difference + halfWidth);
        var pooled = (double)(successes1 + successes2) / (n1 + n2);
        var variance = pooled * (1 - pooled) * ((1.0 / n1) + (1.0 / n2));
        if (!(variance > 0))
        {
            return new TwoProportionTest(first, second, difference, null, null, interval,
                "Both groups have only successes or only failures, so the pooled variance is zero.");
        }

        var z = difference / Math.Sqrt(variance);
        return new TwoProportionTest(first, second, difference, z, StandardNormal.TwoSidedP(z), interval, null);
    }

    /// <summary>
    /// Pearson chi-square goodness-of-fit test (Pearson, Philosophical Magazine, 1900), for example
    /// whether the realised traffic split matches the planned allocation.
    /// </summary>
    /// <param name="observed">Observed counts per category, ≥ 0; at least two categories.</param>
    /// <param name="expectedShares">Planned shares per category, ≥ 0, summing to 1 (within 1e-9).</param>
    /// <returns>
    /// The test with df = categories − 1. No observations: null with a reason. A category with planned
    /// share 0 but observations: null with a reason (the statistic is infinite; the plan is violated).
    /// Categories with share 0 and no observations are skipped.
    /// </returns>
    /// <exception cref="ArgumentException">Lengths differ, fewer than two categories, negative values, or shares not summing to 1.</exception>
    public static GoodnessOfFitTest ChiSquareGoodnessOfFit(IReadOnlyList<long> observed, IReadOnlyList<double> expectedShares)
    {
        if (observed.Count != expectedShares.Count || observed.Count < 2)
        {
            throw new ArgumentException("Observed counts and shares need the same length, at least 2.", nameof(expectedShares));
        }

        if (observed.Any(count => count < 0) || expectedShares.Any(share => !(share >= 0)))
        {
            throw new ArgumentException("Counts and shares must not be negative.", nameof(observed));
        }

        if (Math.Abs(expectedShares.Sum() - 1) > 1e-9)
        {
            throw new ArgumentException("Planned shares must sum to 1.", nameof(expectedShares));
        }

        var degreesOfFreedom = observed.Count - 1;
        long total = observed.Sum();
        if (total == 0)
        {
            return new GoodnessOfFitTest(null, degreesOfFreedom, null, 0, "No observations.");
        }

        double statistic = 0;
        for (var i = 0; i < observed.Count; i++)
        {
            var expected = expectedShares[i] * total;
            if (expected == 0)
            {
                if (observed[i] > 0)
                {
                    return new GoodnessOfFitTest(null, degreesOfFreedom, null, total,
                        $"Category {i} has observations but a planned share of 0.");
                }

                continue;
            }

            var gap = observed[i] - expected;
            statistic += gap * gap / expected;
        }

        var p = SpecialFunctions.GammaUpperRegularized(degreesOfFreedom / 2.0, statistic / 2);
        return new GoodnessOfFitTest(statistic, degreesOfFreedom, p, total, null);
    }
}
