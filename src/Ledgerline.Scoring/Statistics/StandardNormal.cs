using MathNet.Numerics.Distributions;

namespace Ledgerline.Scoring.Statistics;

/// <summary>Standard normal helpers on top of MathNet.Numerics.</summary>
internal static class StandardNormal
{
    /// <summary>Two-sided p-value 2·Φ(−|z|), computed from the lower tail so small values keep precision.</summary>
    public static double TwoSidedP(double z) => Math.Min(1.0, 2.0 * Normal.CDF(0, 1, -Math.Abs(z)));

    /// <summary>Φ⁻¹(p).</summary>
    public static double Quantile(double p) => Normal.InvCDF(0, 1, p);

    /// <summary>z for a two-sided interval of the given confidence level, e.g. 1.959964 for 0.95.</summary>
    public static double TwoSidedCritical(double confidenceLevel) => Quantile(1 - ((1 - confidenceLevel) / 2));
}
