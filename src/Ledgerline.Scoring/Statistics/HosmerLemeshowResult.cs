namespace Ledgerline.Scoring.Statistics;

/// <summary>The Hosmer–Lemeshow statistic with its p-value.</summary>
/// <param name="Statistic">Σ (D_g − E_g)² / (E_g·(1 − p̄_g)); null when undefined, with a reason.</param>
/// <param name="DegreesOfFreedom">Degrees of freedom, as given by the caller.</param>
/// <param name="PValue">P(χ²_df ≥ statistic); null with the statistic.</param>
/// <param name="Groups">Number of groups used.</param>
/// <param name="Reason">Why values are null; null otherwise.</param>
public sealed record HosmerLemeshowResult(double? Statistic, int DegreesOfFreedom, double? PValue, int Groups, string? Reason);
