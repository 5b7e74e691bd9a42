namespace Ledgerline.Scoring.Statistics;

/// <summary>Observed and expected bads in one calibration group (score band, grade or equal-count group).</summary>
/// <param name="Count">Matured decisions in the group; zero or more.</param>
/// <param name="Bads">Bads observed among them; between 0 and <paramref name="Count"/>.</param>
/// <param name="ExpectedBads">Σ PD over the group's decisions, PD from the version's scaling; between 0 and <paramref name="Count"/>.</param>
public sealed record CalibrationCell(long Count, long Bads, double ExpectedBads)
{
    /// <summary>ExpectedBads / Count; null for an empty group.</summary>
    public double? MeanProbabilityOfBad => Count > 0 ? ExpectedBads / Count : null;
}
