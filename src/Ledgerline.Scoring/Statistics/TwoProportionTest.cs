namespace Ledgerline.Scoring.Statistics;

/// <summary>Pooled two-proportion z-test (for example approval rates or bad rates of two arms).</summary>
/// <param name="Proportion1">successes₁/n₁; null when n₁ = 0.</param>
/// <param name="Proportion2">successes₂/n₂; null when n₂ = 0.</param>
/// <param name="Difference">Proportion1 − Proportion2; null when either is.</param>
/// <param name="Z">(p₁ − p₂) / √(p̄(1 − p̄)(1/n₁ + 1/n₂)), p̄ pooled; null when the pooled variance is zero.</param>
/// <param name="PValue">Two-sided p-value 2·Φ(−|Z|); null with <paramref name="Z"/>.</param>
/// <param name="DifferenceConfidenceInterval">95% Wald interval of the difference with unpooled variance; null when either proportion is.</param>
/// <param name="Reason">Why values are null; null otherwise.</param>
public sealed record TwoProportionTest(
    double? Proportion1,
    double? Proportion2,
    double? Difference,
    double? Z,
    double? PValue,
    ConfidenceInterval? DifferenceConfidenceInterval,
    string? Reason);
