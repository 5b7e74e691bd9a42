using Ledgerline.Scoring.Monitoring;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Monitoring;

public class MonitoringRuleTests
{
    private static RocResult Curve(double auc, double? variance) =>
        new(100, 50, auc, (2 * auc) - 1, variance, null, [], null);

    [Fact]
    public void AucDecline_CurrentOneStandardErrorBelow_GivesSOneAndUpperTailP()
    {
        // S = (AUC_dev − AUC_now)/s_now, p = 1 − Φ(S): ECB, "Instructions for reporting the validation
        // results of internal models", 2019, §2.5.4.1. 1 − Φ(1) = 0.158655254 (standard normal table).
        var result = AucDecline.Test(0.80, Curve(0.78, 0.0004));

        Tests.Statistics.Close.Relative(1.0, result.Statistic);
        Tests.Statistics.Close.Relative(0.1586552539, result.PValue, 1e-8);
        Tests.Statistics.Close.Relative(0.02, result.Decline);
        Assert.Null(result.Reason);
    }

    [Fact]
    public void AucDecline_NoVariance_GivesNullStatisticWithReason()
    {
        var result = AucDecline.Test(0.80, Curve(0.78, null));

        Assert.Null(result.Statistic);
        Assert.Null(result.PValue);
        Assert.NotNull(result.Reason);
    }

    [Theory]
    [InlineData(0.0999, StabilityStatus.Green)]
    [InlineData(0.10, StabilityStatus.Amber)]
    [InlineData(0.2499, StabilityStatus.Amber)]
    [InlineData(0.25, StabilityStatus.Red)]
    public void StabilityBands_CommonPracticeThresholds_ClassifyAtTheEdges(double index, StabilityStatus expected)
    {
        // 0.10 / 0.25: common practice (attributed to Lewis, "An Introduction to Credit Scoring", 1992).
        Assert.Equal(expected, StabilityBands.Classify(index, StabilityBands.DefaultAmber, StabilityBands.DefaultRed));
    }

    [Theory]
    [InlineData(29, 500, 100, 100, 0.01, 0.03, Verdict.NotEnoughMaturedOutcomes)]
    [InlineData(200, 500, 29, 100, 0.01, 0.03, Verdict.NotEnoughMaturedOutcomes)]
    [InlineData(200, 500, 100, 100, 0.01, 0.03, Verdict.ChallengerBetter)]
    [InlineData(200, 500, 100, 100, 0.01, -0.03, Verdict.ChallengerWorse)]
    [InlineData(200, 500, 100, 100, 0.05, 0.03, Verdict.NoDifferenceShown)]
    public void ComparisonVerdict_Rule_DecidesFromCountsAndPairedTest(long bads, long goods, long championArmBads, long challengerArmBads, double p, double difference, Verdict expected)
    {
        var paired = new PairedAucTest(goods, bads, 0.7 + difference, 0.7, 0.001, 0.001, 0.0005, difference, 2.0, p, null, null);

        Assert.Equal(expected, new ComparisonVerdict().Decide(paired, championArmBads, challengerArmBads));
    }

    [Fact]
    public void ComparisonVerdict_ZeroVarianceOfDifference_NoDifferenceShown()
    {
        var identical = new PairedAucTest(500, 200, 0.7, 0.7, 0.001, 0.001, 0.001, 0, null, null, null, "zero variance");

        Assert.Equal(Verdict.NoDifferenceShown, new ComparisonVerdict().Decide(identical, 100, 100));
        Assert.Equal("no difference shown", ComparisonVerdict.ToWire(Verdict.NoDifferenceShown));
    }
}
