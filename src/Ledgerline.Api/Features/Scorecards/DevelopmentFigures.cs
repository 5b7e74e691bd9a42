using Ledgerline.Scoring.Scorecards;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>Development AUC (DeLong variance), Gini and KS of a baseline's score histogram.</summary>
internal static class DevelopmentFigures
{
    /// <summary>Null when the sample holds one class only (AUC and KS are undefined then).</summary>
    public static DevelopmentDiscrimination? Compute(IReadOnlyList<DevelopmentScoreCount> histogram)
    {
        var counts = new ScoreHistogram(histogram.Select(h => new ScoreCount((double)h.Score, h.Count - (h.Bads ?? 0), h.Bads ?? 0)));
        var roc = Roc.Compute(counts);
        var ks = KolmogorovSmirnov.Compute(counts);
        if (roc is not { Auc: { } auc, Gini: { } gini, Variance: { } variance } || ks is not { Statistic: { } statistic, Score: { } score })
        {
            return null;
        }

        return new DevelopmentDiscrimination(auc, variance, gini, statistic, (decimal)score);
    }
}
