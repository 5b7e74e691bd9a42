using System.Text.Json;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>
/// A development baseline: either the sample <paramref name="Records"/> (scored here, aggregated,
/// then discarded) or the <paramref name="Aggregates"/> themselves; exactly one of the two.
/// </summary>
/// <param name="Records">Development rows; give <c>bad</c> on every row or on none.</param>
/// <param name="ScoreBinEdges">Upper edges (inclusive, ascending) of the score bins; default: deciles of the development scores.</param>
/// <param name="Aggregates">Aggregates computed elsewhere.</param>
public sealed record BaselineRequest(
    IReadOnlyList<BaselineRecord>? Records,
    IReadOnlyList<decimal>? ScoreBinEdges,
    BaselineAggregates? Aggregates);

/// <summary>One development row: its characteristics and, optionally, whether it went bad.</summary>
public sealed record BaselineRecord(Dictionary<string, JsonElement>? Characteristics, bool? Bad);

/// <summary>A version's baseline as stored.</summary>
public sealed record BaselineResponse(int Version, DateTimeOffset AttachedAt, string AttachedBy, BaselineAggregates Aggregates);
