using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Monitoring;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Api.Features.Reports;

/// <summary>One version's performance figures from its aggregated score cells.</summary>
public static class PerformanceCalculator
{
    public const string HosmerLemeshowRule =
        "degrees of freedom = number of non-empty score bins (G): the live applications are an independent monitoring sample on which no parameter was estimated (G − 2 applies on the development sample)";

    public const string RankOrderingRule =
        "the observed bad rate must not rise from one non-empty score bin to the next higher one (higher score = lower risk); reversals list the upper edges of the bins where it rose";

    public static string PopulationText(int version, string range) =>
        $"applications scored by version {version} (deciding or not) that the deciding version approved, with matured good or bad outcomes; {range}";

    public static VersionPerformance Compute(int version, CompiledScorecard compiled, BaselineAggregates? baseline, IReadOnlyList<ScoreCell> cells, string range)
    {
        var unavailable = new Dictionary<string, string>();
        var decisions = cells.Sum(c => c.Count);
        var approved = cells.Where(c => c.Approved).Sum(c => c.Count);
        var performance = cells.Where(c => c.InPerformance).ToList();
        var indeterminate = cells.Where(c => c.Approved && c.Matured && c.Outcome == PerformanceClass.Indeterminate).Sum(c => c.Count);
        var immature = cells.Where(c => c.Approved && !c.Matured).Sum(c => c.Count);
        var histogram = Histogram(performance.Select(c => (c.Score, c.Outcome, c.Count)));
        var roc = Roc.Compute(histogram);
        var ks = KolmogorovSmirnov.Compute(histogram);
        if (roc.Reason is { } rocReason)
        {
            unavailable["auc"] = rocReason;
        }

        if (ks.Reason is { } ksReason)
        {
            unavailable["ks"] = ksReason;
        }

        double? badRate = histogram.Total > 0 ? (double)histogram.TotalBads / histogram.Total : null;
        if (badRate is null)
        {
            unavailable["badRate"] = "No matured good or bad outcome among approved applications in the range.";
        }

        var roles = cells.GroupBy(c => (c.Role, c.Deciding))
            .Select(g => new RoleVolume(g.Key.Role, g.Key.Deciding, g.Sum(c => c.Count)))
            .OrderByDescending(r => r.Deciding).ThenBy(r => ArmRoleNames.ToWire(r.Role), StringComparer.Ordinal).ToList();

        var (cutPoints, binsText) = ScoreBinsFor(baseline, cells);
        var distribution = Distribution(cells, cutPoints);
        var calibration = CalibrationRows(histogram, cutPoints, compiled);
        var hosmerLemeshow = HosmerLemeshowOf(histogram, cutPoints, compiled);
        var brier = BrierScore.Compute(histogram.Counts.Select(c => new ProbabilityGroup(compiled.Scaling.ProbabilityOfBad((decimal)c.Score), c.Total, c.Bads)));
        if (brier is null)
        {
            unavailable["brierScore"] = "No matured good or bad outcome to score.";
        }

        return new VersionPerformance(
            version, decisions, approved, histogram.Total, histogram.TotalBads, badRate,
            roc.Auc, roc.ConfidenceInterval, roc.Gini, ks.Statistic, ks.Score is { } s ? (decimal)s : null,
            PopulationText(version, range), indeterminate, immature, roles, OwnBands(cells, version, range), roc.StandardError,
            distribution, binsText, CaptureAndLift.Compute(histogram), calibration, hosmerLemeshow, brier,
            RankOrderingOf(calibration), Development(baseline, roc), unavailable);
    }

    public static ScoreHistogram Histogram(IEnumerable<(decimal Score, PerformanceClass? Outcome, long Count)> cells) =>
        new(cells.Select(c => c.Outcome == PerformanceClass.Bad ? new ScoreCount((double)c.Score, 0, c.Count) : new ScoreCount((double)c.Score, c.Count, 0)));

    private static BandRates OwnBands(IReadOnlyList<ScoreCell> cells, int version, string range)
    {
        var total = cells.Sum(c => c.Count);
        double? Share(Band band) => total > 0 ? (double)cells.Where(c => c.Band == band).Sum(c => c.Count) / total : null;
        return new BandRates(Share(Band.Approve), Share(Band.Refer), Share(Band.Decline),
            $"all applications scored by version {version}, by its own decision bands (what it decided or would have decided); {range}");
    }

    /// <summary>Baseline score bins when there is a baseline (right-closed upper edges), else deciles of the live scores.</summary>
    private static (decimal[] CutPoints, string Text) ScoreBinsFor(BaselineAggregates? baseline, IReadOnlyList<ScoreCell> cells)
    {
        if (baseline is not null)
        {
            return (baseline.ScoreBins.Where(b => b.UpTo is not null).Select(b => b.UpTo!.Value).ToArray(),
                "the development baseline's score bins: each holds scores above the previous upper edge up to and including its own");
        }

        var frequencies = cells.GroupBy(c => c.Score).Select(g => new ScoreFrequency((double)g.Key, g.Sum(c => c.Count))).ToList();
        if (frequencies.Count == 0)
        {
            return ([], "one bin: no scores in the range");
        }

        var cuts = ScoreBinning.QuantileCutPoints(frequencies).Select(c => (decimal)Math.Round(c, 4)).Distinct().ToArray();
        return (cuts, "deciles of the live scores in the range (no development baseline); each bin holds scores up to and including its upper edge");
    }

    private static List<ScoreBinRow> Distribution(IReadOnlyList<ScoreCell> cells, decimal[] cutPoints)
    {
        var counts = new long[cutPoints.Length + 1];
        foreach (var cell in cells)
        {
            counts[BinOf(cell.Score, cutPoints)] += cell.Count;
        }

        var total = counts.Sum();
        return counts.Select((count, i) => new ScoreBinRow(i < cutPoints.Length ? cutPoints[i] : null, count, total > 0 ? (double)count / total : null)).ToList();
    }

    private static List<CalibrationRow> CalibrationRows(ScoreHistogram histogram, decimal[] cutPoints, CompiledScorecard compiled)
    {
        var cells = CalibrationCells(histogram, cutPoints, compiled);
        var assessed = Calibration.Assess(cells);
        return assessed.Select((r, i) => new CalibrationRow(i < cutPoints.Length ? cutPoints[i] : null, r.Count, r.Bads,
            r.MeanProbabilityOfBad, r.ObservedBadRate, r.JeffreysP, r.BinomialP, r.Status)).ToList();
    }

    private static IReadOnlyList<CalibrationCell> CalibrationCells(ScoreHistogram histogram, decimal[] cutPoints, CompiledScorecard compiled) =>
        Calibration.CellsByScoreBand(histogram, cutPoints.Select(c => (double)c).ToArray(), BinEdge.RightClosed,
            score => compiled.Scaling.ProbabilityOfBad((decimal)score));

    private static HosmerLemeshowFigure HosmerLemeshowOf(ScoreHistogram histogram, decimal[] cutPoints, CompiledScorecard compiled)
    {
        var groups = CalibrationCells(histogram, cutPoints, compiled).Where(c => c.Count > 0).ToList();
        if (groups.Count == 0)
        {
            return new HosmerLemeshowFigure(null, 0, null, 0, HosmerLemeshowRule, "No matured good or bad outcome to test.");
        }

        var result = HosmerLemeshow.Compute(groups, groups.Count);
        return new HosmerLemeshowFigure(result.Statistic, result.DegreesOfFreedom, result.PValue, result.Groups, HosmerLemeshowRule, result.Reason);
    }

    private static RankOrdering RankOrderingOf(List<CalibrationRow> calibration)
    {
        var filled = calibration.Where(r => r.Matured > 0).ToList();
        if (filled.Count < 2)
        {
            return new RankOrdering(null, [], RankOrderingRule, "Fewer than two score bins hold matured outcomes.");
        }

        var reversals = new List<decimal?>();
        for (var i = 1; i < filled.Count; i++)
        {
            if (filled[i].ObservedBadRate > filled[i - 1].ObservedBadRate)
            {
                reversals.Add(filled[i].UpTo);
            }
        }

        return new RankOrdering(reversals.Count == 0, reversals, RankOrderingRule, null);
    }

    private static DevelopmentComparison? Development(BaselineAggregates? baseline, RocResult roc)
    {
        if (baseline is null)
        {
            return null;
        }

        double? badRate = baseline.Bads is { } bads && baseline.SampleSize > 0 ? (double)bads / baseline.SampleSize : null;
        if (baseline.Discrimination is not { } development)
        {
            return new DevelopmentComparison(baseline.SampleSize, badRate, null, null, null, null, null,
                "The development baseline carried no outcomes, so it has no AUC to compare with.");
        }

        return new DevelopmentComparison(baseline.SampleSize, badRate, development.Auc, development.Gini, development.Ks, development.KsScore,
            AucDecline.Test(development.Auc, roc), null);
    }

    public static int BinOf(decimal score, decimal[] cutPoints)
    {
        var bin = 0;
        while (bin < cutPoints.Length && score > cutPoints[bin])
        {
            bin++;
        }

        return bin;
    }
}
