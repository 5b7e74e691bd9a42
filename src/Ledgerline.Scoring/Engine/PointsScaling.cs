using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Engine;

/// <summary>
/// Points-to-double-odds scaling (Siddiqi, "Credit Risk Scorecards", Wiley 2006): score =
/// offset + factor·ln(odds) with factor = PDO / ln 2 and offset = baseScore − factor·ln(baseOdds).
/// </summary>
public sealed class PointsScaling
{
    /// <summary>Computes factor and offset from a version's scaling.</summary>
    public PointsScaling(Scaling scaling)
    {
        Factor = (double)scaling.PointsToDoubleOdds / Math.Log(2);
        Offset = (double)scaling.BaseScore - (Factor * Math.Log((double)scaling.BaseOdds));
    }

    /// <summary>Points per unit of ln(odds).</summary>
    public double Factor { get; }

    /// <summary>The score at odds 1:1.</summary>
    public double Offset { get; }

    /// <summary>Good:bad odds at a score.</summary>
    public double Odds(decimal score) => Math.Exp(((double)score - Offset) / Factor);

    /// <summary>Probability of bad at a score: 1 / (1 + odds).</summary>
    public double ProbabilityOfBad(decimal score) => 1.0 / (1.0 + Odds(score));
}
