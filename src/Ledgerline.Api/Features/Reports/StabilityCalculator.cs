using System.Globalization;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Monitoring;
using Ledgerline.Scoring.Scorecards;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Api.Features.Reports;

/// <summary>PSI of the score and CSI of every characteristic per period, against the development baseline.</summary>
public static class StabilityCalculator
{
    public const string EmptyBinRuleText =
        "floor shares: each share below 0.0001 counts as 0.0001 (no renormalising), so an emptied bin gives a large finite index";

    public static string Period(DateOnly date, ReportPeriod period) => period == ReportPeriod.Month
        ? date.ToString("yyyy-MM", CultureInfo.InvariantCulture)
        : string.Create(CultureInfo.InvariantCulture, $"{ISOWeek.GetYear(date.ToDateTime(TimeOnly.MinValue))}-W{ISOWeek.GetWeekOfYear(date.ToDateTime(TimeOnly.MinValue)):00}");

    public static List<StabilityPeriod> Compute(
        BaselineAggregates baseline, CompiledScorecard compiled, IReadOnlyList<DailyScoreCell> scores, BinTally bins,
        ReportPeriod period, StabilityThresholdsFigure thresholds)
    {
        var cutPoints = baseline.ScoreBins.Where(b => b.UpTo is not null).Select(b => b.UpTo!.Value).ToArray();
        var expectedScores = baseline.ScoreBins.Select(b => b.Count).ToArray();
        var periods = new List<StabilityPeriod>();
        foreach (var group in scores.GroupBy(s => Period(s.Date, period)).OrderBy(g => g.Key, StringComparer.Ordinal))
        {
            var actual = new long[cutPoints.Length + 1];
            foreach (var cell in group)
            {
                actual[PerformanceCalculator.BinOf(cell.Score, cutPoints)] += cell.Count;
            }

            var n = actual.Sum();
            var psi = StabilityIndex.Compute(expectedScores, actual);
            var characteristics = Characteristics(baseline, compiled, bins.For(group.Key), thresholds);
            periods.Add(new StabilityPeriod(group.Key, n, psi.Value,
                psi.Value is { } value ? StabilityBands.Classify(value, thresholds.PsiAmber, thresholds.PsiRed) : null,
                characteristics, psi.Reason));
        }

        return periods;
    }

    private static List<CharacteristicStability> Characteristics(
        BaselineAggregates baseline, CompiledScorecard compiled, long[][] actual, StabilityThresholdsFigure thresholds)
    {
        var definitions = compiled.Definition.Characteristics;
        var result = new List<CharacteristicStability>(definitions.Count);
        for (var i = 0; i < definitions.Count; i++)
        {
            var name = definitions[i].Name;
            var development = baseline.Characteristics.FirstOrDefault(c => c.Name == name);
            var total = actual[i].Sum();
            double? missingShare = total > 0 ? (double)actual[i][^2] / total : null;
            if (development is null || development.BinCounts.Count != definitions[i].Bins.Count)
            {
                result.Add(new CharacteristicStability(name, null, null, missingShare, null, "The development baseline has no distribution for this characteristic."));
                continue;
            }

            var expected = development.BinCounts.Append(development.Missing).Append(development.Other).ToArray();
            var developmentTotal = expected.Sum();
            double? developmentMissing = developmentTotal > 0 ? (double)development.Missing / developmentTotal : null;
            if (total == 0 || developmentTotal == 0)
            {
                result.Add(new CharacteristicStability(name, null, null, missingShare, developmentMissing, "No applications to compare in this period or in the baseline."));
                continue;
            }

            var csi = StabilityIndex.Compute(expected, actual[i]);
            result.Add(new CharacteristicStability(name, csi.Value,
                csi.Value is { } value ? StabilityBands.Classify(value, thresholds.CsiAmber, thresholds.CsiRed) : null,
                missingShare, developmentMissing, csi.Reason));
        }

        return result;
    }
}
