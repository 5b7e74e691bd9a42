namespace Ledgerline.Scoring.Statistics;

/// <summary>Calibration of one group: expected against observed bad rate, with one-sided tests of "PD too low".</summary>
/// <param name="Count">Matured decisions.</param>
/// <param name="Bads">Observed bads.</param>
/// <param name="MeanProbabilityOfBad">Expected PD (mean PD of the group); null for an empty group.</param>
/// <param name="ObservedBadRate">Bads / Count; null for an empty group.</param>
/// <param name="JeffreysP">BetaCDF(PD; D + ½, N − D + ½); null for an empty group.</param>
/// <param name="BinomialP">P(X ≥ D), X ~ Binomial(N, PD), exact; null for an empty group.</param>
/// <param name="Status">Traffic light from <paramref name="JeffreysP"/>.</param>
/// <param name="Reason">Why values are null; null otherwise.</param>
public sealed record CalibrationGroupResult(
    long Count,
    long Bads,
    double? MeanProbabilityOfBad,
    double? ObservedBadRate,
    double? JeffreysP,
    double? BinomialP,
    TrafficLight Status,
    string? Reason);
