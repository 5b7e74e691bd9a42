namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// Cumulative capture (gains) and lift by score group, riskiest (lowest score) first: the share of
/// bads found in the riskiest k tenths of applications (common practice; Siddiqi, "Credit Risk
/// Scorecards", Wiley, 2006).
/// </summary>
public static class CaptureAndLift
{
    /// <summary>Capture and lift for each of <paramref name="groups"/> equal population shares (10 = deciles).</summary>
    /// <param name="histogram">Goods and bads per score.</param>
    /// <param name="groups">Number of equal shares, at least 1; 10 gives deciles.</param>
    /// <returns>
    /// One row per group. Where a group boundary falls inside a block of tied scores the block is
    /// split pro rata, so every group holds exactly its share and the bads of the block are shared in
    /// proportion. Empty input or no bads: an empty list (capture is undefined).
    /// </returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="groups"/> is below 1.</exception>
    public static IReadOnlyList<CaptureRow> Compute(ScoreHistogram histogram, int groups = 10)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(groups, 1);
        if (histogram.Total == 0 || histogram.TotalBads == 0)
        {
            return [];
        }

        var counts = histogram.Counts;
        double total = histogram.Total;
        double totalBads = histogram.TotalBads;
        var rows = new List<CaptureRow>(groups);
        var index = 0;
        double takenFromCurrent = 0;
        double cumulativeDecisions = 0;
        double cumulativeBads = 0;
        for (var group = 1; group <= groups; group++)
        {
            var target = group == groups ? total : total * group / groups;
            var groupBads = 0.0;
            var upperScore = counts[Math.Min(index, counts.Count - 1)].Score;
            while (index < counts.Count && cumulativeDecisions < target)
            {
                var row = counts[index];
                var left = row.Total - takenFromCurrent;
                var take = Math.Min(left, target - cumulativeDecisions);
                var bads = row.Bads * (take / row.Total);
                cumulativeDecisions += take;
                cumulativeBads += bads;
                groupBads += bads;
                upperScore = row.Score;
                takenFromCurrent += take;
                if (takenFromCurrent >= row.Total)
                {
                    index++;
                    takenFromCurrent = 0;
                }
            }

            var share = (double)group / groups;
            var groupDecisions = total / groups;
            var capture = cumulativeBads / totalBads;
            rows.Add(new CaptureRow(group, share, upperScore, cumulativeDecisions, cumulativeBads,
                groupBads / groupDecisions, capture, capture / share));
        }

        return rows;
    }
}
