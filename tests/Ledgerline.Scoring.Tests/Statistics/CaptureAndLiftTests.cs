using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Tests.Statistics;

public class CaptureAndLiftTests
{
    [Fact]
    public void Compute_OneDecisionPerScore_CapturesBadsOfRiskiestTenths()
    {
        // Hand-computed: 20 scores 1..20, bads at scores 1, 2, 3 and 15; deciles of two scores each (common practice)
        var histogram = new ScoreHistogram(Enumerable.Range(1, 20)
            .Select(score => new ScoreCount(score, score is 1 or 2 or 3 or 15 ? 0 : 1, score is 1 or 2 or 3 or 15 ? 1 : 0)));

        var rows = CaptureAndLift.Compute(histogram);

        Assert.Equal(10, rows.Count);
        Assert.Equal(0.5, rows[0].CaptureRate, 12);
        Assert.Equal(5.0, rows[0].Lift, 12);
        Assert.Equal(2.0, rows[0].UpperScore);
        Assert.Equal(0.75, rows[1].CaptureRate, 12);
        Assert.Equal(0.5, rows[1].GroupBadRate, 12);
        Assert.Equal(1.0, rows[7].CaptureRate, 12);
        Assert.Equal(1.0, rows[9].CaptureRate, 12);
        Assert.Equal(1.0, rows[9].Lift, 12);
    }

    [Fact]
    public void Compute_TiedBlockAcrossBoundary_IsSplitProRata()
    {
        // Definition stated in the XML docs: a tie block straddling a boundary is shared in proportion (common practice)
        var histogram = new ScoreHistogram([new ScoreCount(500, 2, 2), new ScoreCount(600, 4, 0)]);

        var rows = CaptureAndLift.Compute(histogram, groups: 2);

        Assert.Equal(4.0, rows[0].Decisions, 12);
        Assert.Equal(2.0, rows[0].Bads, 12);
        Assert.Equal(1.0, rows[0].CaptureRate, 12);
        Assert.Equal(2.0, rows[0].Lift, 12);
    }

    [Fact]
    public void Compute_NoBads_ReturnsEmpty()
    {
        // Capture is a share of bads, undefined without bads (common practice)
        Assert.Empty(CaptureAndLift.Compute(new ScoreHistogram([new ScoreCount(600, 5, 0)])));
    }
}
