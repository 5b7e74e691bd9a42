namespace Ledgerline.Scoring.Statistics;

/// <summary>One bin of a stability index.</summary>
/// <param name="Bin">Zero-based bin index.</param>
/// <param name="ExpectedCount">Decisions in the bin in the reference (expected) distribution.</param>
/// <param name="ActualCount">Decisions in the bin in the current (actual) distribution.</param>
/// <param name="ExpectedShare">Reference share used in the formula, after the empty-bin rule.</param>
/// <param name="ActualShare">Current share used in the formula, after the empty-bin rule.</param>
/// <param name="Contribution">(a − e)·ln(a/e); null when infinite under <see cref="EmptyBinRule.None"/>.</param>
public sealed record StabilityBin(
    int Bin,
    long ExpectedCount,
    long ActualCount,
    double ExpectedShare,
    double ActualShare,
    double? Contribution);
