namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// The Brier score, the mean squared difference between predicted PD and outcome (Brier,
/// "Verification of forecasts expressed in terms of probability", Monthly Weather Review, 1950).
/// </summary>
public static class BrierScore
{
    /// <summary>
    /// Brier score from aggregates: Σ_g (n_g·PD_g² − 2·PD_g·D_g + D_g) / N. Exact when every decision in a
    /// group has the same PD, for example groups by distinct score.
    /// </summary>
    /// <param name="groups">Groups of decisions sharing a PD.</param>
    /// <returns>The score in [0, 1]; null when there are no decisions.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A group is inconsistent.</exception>
    public static double? Compute(IEnumerable<ProbabilityGroup> groups)
    {
        double sum = 0;
        long total = 0;
        foreach (var group in groups)
        {
            ArgumentOutOfRangeException.ThrowIfNegative(group.Count);
            ArgumentOutOfRangeException.ThrowIfNegative(group.Bads);
            ArgumentOutOfRangeException.ThrowIfGreaterThan(group.Bads, group.Count);
            if (!(group.ProbabilityOfBad is >= 0 and <= 1))
            {
                throw new ArgumentOutOfRangeException(nameof(groups), "A probability of bad must lie in [0, 1].");
            }

            var pd = group.ProbabilityOfBad;
            // (PD − 1)² for each bad plus PD² for each good.
            sum += (group.Bads * (1 - pd) * (1 - pd)) + ((group.Count - group.Bads) * pd * pd);
            total += group.Count;
        }

        return total == 0 ? null : sum / total;
    }
}
