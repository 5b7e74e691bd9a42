namespace Ledgerline.Scoring.Monitoring;

/// <summary>
/// Stability bands of a PSI or CSI (common practice, attributed to Lewis, "An Introduction to Credit
/// Scoring", 1992): below the amber threshold no significant shift; from amber to red a shift to
/// investigate; at or above red a shift that warrants rebuilding.
/// </summary>
public enum StabilityStatus
{
    /// <summary>Below the amber threshold.</summary>
    Green,

    /// <summary>At or above the amber threshold, below the red one.</summary>
    Amber,

    /// <summary>At or above the red threshold.</summary>
    Red,
}

/// <summary>Classifies an index against thresholds.</summary>
public static class StabilityBands
{
    /// <summary>The common-practice amber threshold, 0.10.</summary>
    public const double DefaultAmber = 0.10;

    /// <summary>The common-practice red threshold, 0.25.</summary>
    public const double DefaultRed = 0.25;

    /// <summary>The band of <paramref name="index"/>; red at or above <paramref name="red"/>, amber at or above <paramref name="amber"/>.</summary>
    /// <param name="index">A PSI or CSI, zero or more.</param>
    /// <param name="amber">Amber threshold.</param>
    /// <param name="red">Red threshold, at least <paramref name="amber"/>.</param>
    /// <returns>The status.</returns>
    public static StabilityStatus Classify(double index, double amber, double red) =>
        index >= red ? StabilityStatus.Red : index >= amber ? StabilityStatus.Amber : StabilityStatus.Green;
}
