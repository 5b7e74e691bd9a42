namespace Ledgerline.Scoring.Statistics;

/// <summary>Which side of a bin includes its cut point. With integer scores the choice changes the counts.</summary>
public enum BinEdge
{
    /// <summary>Bins (−∞, c₁], (c₁, c₂], …, (c_k, ∞): a score equal to a cut point falls in the lower bin.</summary>
    RightClosed,

    /// <summary>Bins (−∞, c₁), [c₁, c₂), …, [c_k, ∞): a score equal to a cut point falls in the upper bin.</summary>
    LeftClosed,
}
