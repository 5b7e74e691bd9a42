namespace Ledgerline.Scoring.Statistics;

/// <summary>Decisions sharing one predicted probability of bad (for example all decisions at one score).</summary>
/// <param name="ProbabilityOfBad">The predicted PD, in [0, 1].</param>
/// <param name="Count">Decisions; zero or more.</param>
/// <param name="Bads">Bads among them; between 0 and <paramref name="Count"/>.</param>
public sealed record ProbabilityGroup(double ProbabilityOfBad, long Count, long Bads);
