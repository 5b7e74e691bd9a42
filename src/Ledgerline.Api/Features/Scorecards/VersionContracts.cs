using System.Text.Json;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>A points table to register (see the wire contract). Server-owned fields (version, status, hash) are refused.</summary>
public sealed record RegisterVersionRequest(
    string? Description,
    decimal? BasePoints,
    ScalingDocument? Scaling,
    int? ReasonCodeCount,
    IReadOnlyList<CharacteristicDocument>? Characteristics,
    IReadOnlyList<DecisionBandDocument>? DecisionBands);

/// <summary>Points-to-double-odds scaling.</summary>
public sealed record ScalingDocument(decimal? BaseScore, decimal? BaseOdds, decimal? PointsToDoubleOdds);

/// <summary>One characteristic: <c>numeric</c> bins are [from, upTo); <c>categorical</c> bins list values.</summary>
public sealed record CharacteristicDocument(
    string? Name,
    string? Type,
    string? ReasonCode,
    string? ReasonText,
    IReadOnlyList<BinDocument>? Bins,
    decimal? MissingPoints,
    decimal? OtherPoints);

/// <summary>One bin with its points.</summary>
public sealed record BinDocument(decimal? From, decimal? UpTo, IReadOnlyList<string>? Values, decimal? Points);

/// <summary>Scores at or above <paramref name="MinScore"/> get <paramref name="Decision"/>; the last band has no minimum.</summary>
public sealed record DecisionBandDocument(decimal? MinScore, string? Decision);

/// <summary>The answer to a registration.</summary>
public sealed record RegisteredVersionResponse(int Version, string Status, string ContentHash);

/// <summary>A version with its lifecycle and its points table.</summary>
public sealed record VersionResponse(
    int Version,
    string Status,
    string ContentHash,
    DateTimeOffset RegisteredAt,
    string RegisteredBy,
    DateTimeOffset? ApprovedAt,
    string? ApprovedBy,
    DateTimeOffset? RetiredAt,
    string? RetiredBy,
    bool HasBaseline,
    RegisterVersionRequest Content);

/// <summary>One application's characteristics: name → number, text or null.</summary>
public sealed record ScoreRequest(Dictionary<string, JsonElement>? Characteristics);

/// <summary>How one version scored one application.</summary>
public sealed record ScoreResponse(
    int Version,
    decimal Score,
    double ProbabilityOfBad,
    Band Decision,
    IReadOnlyList<ReasonCodeResponse> ReasonCodes,
    IReadOnlyList<CharacteristicScore> Characteristics);

/// <summary>A reason code, as the contract fixes it.</summary>
public sealed record ReasonCodeResponse(string Code, string Characteristic, string Text, decimal PointsBelowMax);

/// <summary>The bin one characteristic matched and the points it gave.</summary>
/// <param name="Name">The characteristic.</param>
/// <param name="Bin">The bin index, or null when <paramref name="Matched"/> is <c>missing</c> or <c>other</c>.</param>
/// <param name="Matched"><c>bin</c>, <c>missing</c> or <c>other</c>.</param>
/// <param name="Points">The points it contributed.</param>
public sealed record CharacteristicScore(string Name, int? Bin, string Matched, decimal Points);
