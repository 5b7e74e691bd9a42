using MathNet.Numerics;
using MathNet.Numerics.Distributions;

namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Per-group calibration tests of the PD implied by a version's scaling against observed bads.
/// Jeffreys test: European Central Bank, "Instructions for reporting the validation results of
/// internal models", 2019, §2.5.3.1. Binomial test: Basel Committee on Banking Supervision,
/// "Studies on the validation of internal rating systems", Working Paper 14, 2005.
/// </summary>
public static class Calibration
{
    /// <summary>Jeffreys one-sided p-value, BetaCDF(pd; bads + ½, count − bads + ½). Small values mean the PD is too low.</summary>
    /// <param name="count">Decisions N ≥ 0.</param>
    /// <param name="bads">Bads D, 0 ≤ D ≤ N.</param>
    /// <param name="probabilityOfBad">Expected PD in [0, 1].</param>
    /// <returns>The p-value in [0, 1].</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double JeffreysP(long count, long bads, double probabilityOfBad)
    {
        Check(count, bads, probabilityOfBad);
        return Beta.CDF(bads + 0.5, count - bads + 0.5, probabilityOfBad);
    }

    /// <summary>
    /// Exact binomial one-sided p-value P(X ≥ bads), X ~ Binomial(count, pd), from the identity
    /// P(X ≥ D) = I_pd(D, N − D + 1) (regularized incomplete beta), which keeps precision in the far tail.
    /// </summary>
    /// <param name="count">Decisions N ≥ 0.</param>
    /// <param name="bads">Bads D, 0 ≤ D ≤ N.</param>
    /// <param name="probabilityOfBad">Expected PD in [0, 1].</param>
    /// <returns>The p-value in [0, 1]; 1 when no bads were observed.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double BinomialP(long count, long bads, double probabilityOfBad)
    {
        Check(count, bads, probabilityOfBad);
        if (bads == 0)
        {
            return 1;
        }

        if (probabilityOfBad == 0)
        {
            return 0;
        }

        return probabilityOfBad == 1 ? 1 : SpecialFunctions.BetaRegularized(bads, count - bads + 1, probabilityOfBad);
    }

    /// <summary>Tests every group: expected PD, observed rate, Jeffreys and binomial p-values and traffic light.</summary>
    /// <param name="groups">One cell per group.</param>
    /// <param name="yellowBelow">Jeffreys p below which a group is yellow; 0.05 by default.</param>
    /// <param name="redBelow">Jeffreys p below which a group is red; 0.001 by default.</param>
    /// <returns>One result per group, same order; an empty group has null statistics and status <see cref="TrafficLight.NotAssessed"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A cell is inconsistent (negative count, more bads than decisions, expected bads outside [0, count]).</exception>
    public static IReadOnlyList<CalibrationGroupResult> Assess(
        IEnumerable<CalibrationCell> groups,
        double yellowBelow = 0.05,
        double redBelow = 0.001)
    {
        var results = new List<CalibrationGroupResult>();
        foreach (var cell in groups)
        {
            if (cell.Count == 0)
            {
                Check(cell.Count, cell.Bads, 0);
                results.Add(new CalibrationGroupResult(0, 0, null, null, null, null, TrafficLight.NotAssessed, "The group is empty."));
                continue;
            }

            var pd = cell.ExpectedBads / cell.Count;
            var jeffreys = JeffreysP(cell.Count, cell.Bads, pd);
            var binomial = BinomialP(cell.Count, cell.Bads, pd);
            var status = jeffreys < redBelow ? TrafficLight.Red : jeffreys < yellowBelow ? TrafficLight.Yellow : TrafficLight.Green;
            results.Add(new CalibrationGroupResult(cell.Count, cell.Bads, pd, (double)cell.Bads / cell.Count,
                jeffreys, binomial, status, null));
        }

        return results;
    }

    /// <summary>
    /// Calibration cells per score band: PD from the version's scaling at each distinct score,
    /// summed over the band's goods and bads.
    /// </summary>
    /// <param name="histogram">Matured goods and bads per score.</param>
    /// <param name="cutPoints">Ascending band cut points (k cut points give k + 1 bands).</param>
    /// <param name="edge">Which side of each band includes its cut point.</param>
    /// <param name="probabilityOfBad">PD at a score, e.g. from the version's points-to-double-odds scaling.</param>
    /// <returns>One cell per band, lowest scores first.</returns>
    public static IReadOnlyList<CalibrationCell> CellsByScoreBand(
        ScoreHistogram histogram,
        IReadOnlyList<double> cutPoints,
        BinEdge edge,
        Func<double, double> probabilityOfBad)
    {
        var counts = new long[cutPoints.Count + 1];
        var bads = new long[cutPoints.Count + 1];
        var expected = new double[cutPoints.Count + 1];
        foreach (var row in histogram.Counts)
        {
            var band = ScoreBinning.BinOf(row.Score, cutPoints, edge);
            counts[band] += row.Total;
            bads[band] += row.Bads;
            expected[band] += row.Total * probabilityOfBad(row.Score);
        }

        return Enumerable.Range(0, counts.Length).Select(i => new CalibrationCell(counts[i], bads[i], expected[i])).ToArray();
    }

    private static void Check(long count, long bads, double probabilityOfBad)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        ArgumentOutOfRangeException.ThrowIfNegative(bads);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(bads, count);
        if (!(probabilityOfBad is >= 0 and <= 1))
        {
            throw new ArgumentOutOfRangeException(nameof(probabilityOfBad), "A probability of bad must lie in [0, 1].");
        }
    }
}
