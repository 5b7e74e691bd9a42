namespace Ledgerline.Scoring.Statistics;

/// <summary>
/// One point of the ROC curve with bad as the event: decisions with score ≤ <see cref="CutOff"/> are
/// classed bad. Plot x = <see cref="FalsePositiveRate"/>, y = <see cref="TruePositiveRate"/>.
/// </summary>
/// <param name="CutOff">The cut-off score; null for the origin (nothing classed bad).</param>
/// <param name="FalsePositiveRate">Share of goods with score ≤ cut-off (x axis).</param>
/// <param name="TruePositiveRate">Share of bads with score ≤ cut-off (y axis).</param>
public sealed record RocPoint(double? CutOff, double FalsePositiveRate, double TruePositiveRate);
