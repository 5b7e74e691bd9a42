namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// How the stability index treats a bin with no decisions, where ln(a/e) is undefined. No
/// authoritative rule exists, so the rule used is part of every result.
/// </summary>
public enum EmptyBinRule
{
    /// <summary>
    /// Each share is replaced by max(share, ε) without renormalising (ε = 1e-4 unless set). The
    /// default: when no share is below ε the index equals the plain formula exactly, so ordinary
    /// reports agree with textbook figures, while an emptied bin still gives a large, finite value.
    /// </summary>
    FloorShares,

    /// <summary>
    /// Half a decision is added to every bin of both distributions, share = (count + 0.5)/(N + 0.5·B)
    /// (a Jeffreys-style correction). Changes every bin slightly, even with no empty bin.
    /// </summary>
    AddHalfCount,

    /// <summary>
    /// No adjustment: an empty bin in one distribution makes the index infinite, reported as a null
    /// value with a reason. A bin empty in both contributes nothing.
    /// </summary>
    None,
}
