namespace Ledgerline.Scoring.Statistics;

/// <summary>Cut points from a reference score distribution and assignment of scores to the bins they define.</summary>
public static class ScoreBinning
{
    /// <summary>
    /// Cut points at the quantiles 1/bins, 2/bins, …, (bins − 1)/bins of a score distribution, by linear
    /// interpolation between order statistics: Hyndman &amp; Fan, "Sample quantiles in statistical
    /// packages", The American Statistician, 1996, definition 7 (R <c>quantile(type = 7)</c>, numpy's
    /// default). The sample is expanded from the counts implicitly, so memory stays O(distinct scores).
    /// </summary>
    /// <param name="reference">Counts per score, any order; the reference (expected) population.</param>
    /// <param name="bins">Number of bins, at least 2; the result has bins − 1 cut points, ascending (possibly repeated with heavy ties).</param>
    /// <returns>The cut points.</returns>
    /// <exception cref="ArgumentException">The distribution is empty, a count is negative or a score not finite.</exception>
    public static IReadOnlyList<double> QuantileCutPoints(IEnumerable<ScoreFrequency> reference, int bins = 10)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(bins, 2);
        var sorted = Sorted(reference);
        long n = sorted.Sum(row => row.Count);
        if (n == 0)
        {
            throw new ArgumentException("The reference distribution is empty.", nameof(reference));
        }

        var cutPoints = new double[bins - 1];
        for (var k = 1; k < bins; k++)
        {
            var probability = (double)k / bins;
            var position = (n - 1) * probability;
            var lowIndex = (long)Math.Floor(position);
            var fraction = position - lowIndex;
            var low = OrderStatistic(sorted, lowIndex);
            var high = lowIndex + 1 < n ? OrderStatistic(sorted, lowIndex + 1) : low;

            // As R: interpolate only where the neighbours differ, so tied cut points stay exact.
            cutPoints[k - 1] = fraction > 0 && high != low ? ((1 - fraction) * low) + (fraction * high) : low;
        }

        return cutPoints;
    }

    /// <summary>Counts per bin for a score distribution and ascending cut points.</summary>
    /// <param name="scores">Counts per score, any order.</param>
    /// <param name="cutPoints">Ascending cut points c₁ ≤ … ≤ c_k; k + 1 bins result.</param>
    /// <param name="edge">Which side of each bin includes its cut point.</param>
    /// <returns>Counts for bins 0..k.</returns>
    /// <exception cref="ArgumentException">Cut points are not ascending, a count is negative or a score not finite.</exception>
    public static long[] Assign(IEnumerable<ScoreFrequency> scores, IReadOnlyList<double> cutPoints, BinEdge edge)
    {
        for (var i = 1; i < cutPoints.Count; i++)
        {
            if (!(cutPoints[i] >= cutPoints[i - 1]))
            {
                throw new ArgumentException("Cut points must be ascending.", nameof(cutPoints));
            }
        }

        var counts = new long[cutPoints.Count + 1];
        foreach (var row in scores)
        {
            Validate(row);
            counts[BinOf(row.Score, cutPoints, edge)] += row.Count;
        }

        return counts;
    }

    /// <summary>Zero-based bin of one score.</summary>
    /// <param name="score">The score.</param>
    /// <param name="cutPoints">Ascending cut points.</param>
    /// <param name="edge">Which side of each bin includes its cut point.</param>
    /// <returns>The number of cut points below the score (right-closed) or at or below it (left-closed).</returns>
    public static int BinOf(double score, IReadOnlyList<double> cutPoints, BinEdge edge)
    {
        // Binary search for the first cut point the score does not pass.
        int low = 0;
        int high = cutPoints.Count;
        while (low < high)
        {
            var middle = (low + high) / 2;
            var passes = edge == BinEdge.RightClosed ? cutPoints[middle] < score : cutPoints[middle] <= score;
            if (passes)
            {
                low = middle + 1;
            }
            else
            {
                high = middle;
            }
        }

        return low;
    }

    private static List<ScoreFrequency> Sorted(IEnumerable<ScoreFrequency> rows)
    {
        var list = new List<ScoreFrequency>();
        foreach (var row in rows)
        {
            Validate(row);
            if (row.Count > 0)
            {
                list.Add(row);
            }
        }

        list.Sort((x, y) => x.Score.CompareTo(y.Score));
        return list;
    }

    private static void Validate(ScoreFrequency row)
    {
        if (!double.IsFinite(row.Score) || row.Count < 0)
        {
            throw new ArgumentException($"Invalid row: score {row.Score}, count {row.Count}.", nameof(row));
        }
    }

    private static double OrderStatistic(List<ScoreFrequency> sorted, long index)
    {
        long seen = 0;
        foreach (var row in sorted)
        {
            seen += row.Count;
            if (index < seen)
            {
                return row.Score;
            }
        }

        return sorted[^1].Score;
    }
}
