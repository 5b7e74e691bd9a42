using System.Collections.Concurrent;
using Ledgerline.Scoring.Engine;

namespace Ledgerline.Api.Features.Scorecards;

/// <summary>
/// Compiled points tables by (scorecard id, version number). Versions are immutable, so an entry
/// never goes stale and every instance may cache every version forever.
/// </summary>
public sealed class VersionCache
{
    private readonly ConcurrentDictionary<(long ScorecardId, int Version), CompiledScorecard> _compiled = new();

    public CompiledScorecard GetOrCompile(long scorecardId, int version, string canonicalContent) =>
        _compiled.GetOrAdd((scorecardId, version), static (_, content) => CompiledScorecard.Compile(VersionMapping.ParseStored(content)), canonicalContent);

    public bool TryGet(long scorecardId, int version, out CompiledScorecard? compiled) =>
        _compiled.TryGetValue((scorecardId, version), out compiled);
}
