namespace Ledgerline.Scoring.Statistics;

/// <summary>A population (PSI) or characteristic (CSI) stability index with its bins.</summary>
/// <param name="Value">Σ (a − e)·ln(a/e) over bins (natural log); null when infinite or undefined, with a reason.</param>
/// <param name="Bins">Per-bin counts, shares and contributions.</param>
/// <param name="Rule">The empty-bin rule applied.</param>
/// <param name="Epsilon">The floor used by <see cref="EmptyBinRule.FloorShares"/>; null for other rules.</param>
/// <param name="Adjusted">True when the rule changed at least one share.</param>
/// <param name="Reason">Why <paramref name="Value"/> is null; null otherwise.</param>
public sealed record StabilityIndexResult(
    double? Value,
    IReadOnlyList<StabilityBin> Bins,
    EmptyBinRule Rule,
    double? Epsilon,
    bool Adjusted,
    string? Reason);
