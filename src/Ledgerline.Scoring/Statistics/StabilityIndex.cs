namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Population stability index over fixed bins, PSI = Σ (a_i − e_i)·ln(a_i/e_i) with e the reference
/// (expected) shares and a the current (actual) shares: a symmetrised Kullback–Leibler divergence
/// (common practice; thresholds 0.10 / 0.25 attributed to Lewis, "An Introduction to Credit
/// Scoring", 1992). Applied to the attribute distribution of one characteristic it is the
/// characteristic stability index (CSI); the computation is the same.
/// </summary>
public static class StabilityIndex
{
    /// <summary>The default floor for <see cref="EmptyBinRule.FloorShares"/>.</summary>
    public const double DefaultEpsilon = 1e-4;

    /// <summary>Computes the index from counts per bin.</summary>
    /// <param name="expectedCounts">Reference counts per bin (fixed when the version was deployed).</param>
    /// <param name="actualCounts">Current counts per bin, same bins and order.</param>
    /// <param name="rule">How empty bins are treated; <see cref="EmptyBinRule.FloorShares"/> by default.</param>
    /// <param name="epsilon">The floor for <see cref="EmptyBinRule.FloorShares"/>, in (0, 1).</param>
    /// <returns>
    /// The index and its bins. Identical distributions give exactly 0. With <see cref="EmptyBinRule.None"/>
    /// and a bin empty in only one distribution the value is null (infinite) with a reason.
    /// </returns>
    /// <exception cref="ArgumentException">
    /// The bin counts differ, there are no bins, a count is negative, or either distribution is empty.
    /// </exception>
    public static StabilityIndexResult Compute(
        IReadOnlyList<long> expectedCounts,
        IReadOnlyList<long> actualCounts,
        EmptyBinRule rule = EmptyBinRule.FloorShares,
        double epsilon = DefaultEpsilon)
    {
        if (expectedCounts.Count != actualCounts.Count)
        {
            throw new ArgumentException("Expected and actual distributions must have the same bins.", nameof(actualCounts));
        }

        if (expectedCounts.Count == 0)
        {
            throw new ArgumentException("At least one bin is needed.", nameof(expectedCounts));
        }

        if (!(epsilon is > 0 and < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(epsilon), "Epsilon must lie in (0, 1).");
        }

        if (expectedCounts.Any(count => count < 0) || actualCounts.Any(count => count < 0))
        {
            throw new ArgumentException("Counts must not be negative.", nameof(expectedCounts));
        }

        double expectedTotal = expectedCounts.Sum();
        double actualTotal = actualCounts.Sum();
        if (expectedTotal == 0 || actualTotal == 0)
        {
            throw new ArgumentException("Both distributions need at least one decision.", nameof(expectedCounts));
        }

        var binCount = expectedCounts.Count;
        var bins = new StabilityBin[binCount];
        var adjusted = false;
        var infinite = false;
        double value = 0;
        for (var i = 0; i < binCount; i++)
        {
            double e;
            double a;
            switch (rule)
            {
                case EmptyBinRule.FloorShares:
                    e = Math.Max(expectedCounts[i] / expectedTotal, epsilon);
                    a = Math.Max(actualCounts[i] / actualTotal, epsilon);
                    adjusted |= e != expectedCounts[i] / expectedTotal || a != actualCounts[i] / actualTotal;
                    break;
                case EmptyBinRule.AddHalfCount:
                    e = (expectedCounts[i] + 0.5) / (expectedTotal + (0.5 * binCount));
                    a = (actualCounts[i] + 0.5) / (actualTotal + (0.5 * binCount));
                    adjusted = true;
                    break;
                case EmptyBinRule.None:
                    e = expectedCounts[i] / expectedTotal;
                    a = actualCounts[i] / actualTotal;
                    break;
                default:
                    throw new ArgumentOutOfRangeException(nameof(rule), rule, "Unknown empty-bin rule.");
            }

            double? contribution;
            if (e == a)
            {
                // Also covers a bin empty in both distributions under EmptyBinRule.None.
                contribution = 0;
            }
            else if (e == 0 || a == 0)
            {
                contribution = null;
                infinite = true;
            }
            else
            {
                contribution = (a - e) * Math.Log(a / e);
                value += contribution.Value;
            }

            bins[i] = new StabilityBin(i, expectedCounts[i], actualCounts[i], e, a, contribution);
        }

        var usedEpsilon = rule == EmptyBinRule.FloorShares ? epsilon : (double?)null;
        return infinite
            ? new StabilityIndexResult(null, bins, rule, usedEpsilon, adjusted,
                "A bin is empty in one distribution only, so the index is infinite; choose an empty-bin rule.")
            : new StabilityIndexResult(value, bins, rule, usedEpsilon, adjusted, null);
    }
}
