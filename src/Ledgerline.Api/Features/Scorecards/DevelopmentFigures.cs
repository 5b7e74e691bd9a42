using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>Development AUC, Gini and KS of a baseline's score histogram.</summary>
internal static class DevelopmentFigures
{
    public static DevelopmentDiscrimination? Compute(IReadOnlyList<ScoreFrequency> histogram) => null;
}
