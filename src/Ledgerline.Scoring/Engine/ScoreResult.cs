using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Engine;

/// <summary>A bin index that means the value was missing and <c>missingPoints</c> applied.</summary>
public static class MatchedBin
{
    /// <summary>The value was absent or null; the characteristic's missing points applied.</summary>
    public const int Missing = -1;

    /// <summary>A category no bin lists; the characteristic's other points applied.</summary>
    public const int Other = -2;
}

/// <summary>The score of one application by one version.</summary>
/// <param name="Score">Base points plus the points of every characteristic, exact.</param>
/// <param name="ProbabilityOfBad">PD from the version's scaling: 1 / (1 + odds(score)).</param>
/// <param name="Band">The decision band the score falls in.</param>
/// <param name="MatchedBins">Per characteristic (version order): the bin index, or a <see cref="MatchedBin"/> constant.</param>
/// <param name="Points">Per characteristic (version order): the points it contributed.</param>
/// <param name="ReasonCodes">The characteristics that cost the most points, most first.</param>
public sealed record ScoreResult(
    decimal Score,
    double ProbabilityOfBad,
    Band Band,
    int[] MatchedBins,
    decimal[] Points,
    ReasonCode[] ReasonCodes);

/// <summary>A reason code: a characteristic whose points fell below its maximum.</summary>
/// <param name="Code">The characteristic's reason code.</param>
/// <param name="Characteristic">The characteristic's name.</param>
/// <param name="Text">The characteristic's reason text.</param>
/// <param name="PointsBelowMax">The characteristic's best points minus the applicant's points (positive).</param>
public sealed record ReasonCode(string Code, string Characteristic, string Text, decimal PointsBelowMax);

/// <summary>Why one application could not be scored.</summary>
/// <param name="Characteristic">The characteristic at fault.</param>
/// <param name="Message">What was wrong and what was expected.</param>
public sealed record ScoringFailure(string Characteristic, string Message);
