namespace Ledgerline.Scoring.Scorecards;

/// <summary>
/// The content of one scorecard version: an immutable points table with its scaling, decision
/// bands and reason-code settings. Validate with <see cref="ScorecardValidator"/> before use.
/// </summary>
/// <param name="Description">Free text describing the version; part of the content hash.</param>
/// <param name="BasePoints">Constant added to every score (points).</param>
/// <param name="Scaling">How points map to good:bad odds and so to a probability of bad.</param>
/// <param name="ReasonCodeCount">How many reason codes a decision returns at most.</param>
/// <param name="Characteristics">The characteristics, in the order that breaks reason-code ties.</param>
/// <param name="DecisionBands">Score cut-offs, read top down; the last has no minimum score.</param>
public sealed record ScorecardDefinition(
    string? Description,
    decimal BasePoints,
    Scaling Scaling,
    int ReasonCodeCount,
    IReadOnlyList<CharacteristicDefinition> Characteristics,
    IReadOnlyList<DecisionBand> DecisionBands)
{
    /// <summary>US adverse-action practice names up to four principal reasons (common practice, from memory).</summary>
    public const int DefaultReasonCodeCount = 4;
}

/// <summary>
/// Points-to-double-odds scaling: score = offset + factor·ln(odds), factor = PDO / ln 2,
/// offset = baseScore − factor·ln(baseOdds), odds = good:bad.
/// </summary>
/// <param name="BaseScore">The score at which the good:bad odds equal <paramref name="BaseOdds"/>.</param>
/// <param name="BaseOdds">Good:bad odds at the base score; must be positive.</param>
/// <param name="PointsToDoubleOdds">Points that double the odds; must be positive.</param>
public sealed record Scaling(decimal BaseScore, decimal BaseOdds, decimal PointsToDoubleOdds);

/// <summary>Whether a characteristic's bins are numeric intervals or sets of category values.</summary>
public enum CharacteristicType
{
    /// <summary>Bins are left-closed, right-open intervals [from, upTo).</summary>
    Numeric,

    /// <summary>Bins are disjoint sets of text values.</summary>
    Categorical,
}

/// <summary>One characteristic of the points table.</summary>
/// <param name="Name">Name used in scoring input; unique within the version.</param>
/// <param name="Type">Numeric or categorical.</param>
/// <param name="ReasonCode">Code returned when this characteristic costs the applicant points.</param>
/// <param name="ReasonText">Human-readable reason, shown with the code.</param>
/// <param name="Bins">Numeric intervals in ascending order, or categorical value sets.</param>
/// <param name="MissingPoints">Points for an absent or null value; when null such input is rejected.</param>
/// <param name="OtherPoints">Categorical only: points for a value no bin lists; when null such input is rejected.</param>
public sealed record CharacteristicDefinition(
    string Name,
    CharacteristicType Type,
    string ReasonCode,
    string ReasonText,
    IReadOnlyList<BinDefinition> Bins,
    decimal? MissingPoints,
    decimal? OtherPoints);

/// <summary>
/// One bin. Numeric bins use <paramref name="From"/> (inclusive) and <paramref name="UpTo"/>
/// (exclusive); categorical bins use <paramref name="Values"/>.
/// </summary>
public sealed record BinDefinition(decimal? From, decimal? UpTo, IReadOnlyList<string>? Values, decimal Points);

/// <summary>A decision band: scores at or above <paramref name="MinScore"/> get <paramref name="Band"/>.</summary>
/// <param name="MinScore">Lowest score of the band; null only on the last (catch-all) band.</param>
/// <param name="Band">What scores in the band are told: approve, refer or decline.</param>
public sealed record DecisionBand(decimal? MinScore, Band Band);

/// <summary>What a decision band tells the origination system to do.</summary>
public enum Band
{
    /// <summary>Approve the application.</summary>
    Approve,

    /// <summary>Refer the application to an underwriter.</summary>
    Refer,

    /// <summary>Decline the application.</summary>
    Decline,
}
