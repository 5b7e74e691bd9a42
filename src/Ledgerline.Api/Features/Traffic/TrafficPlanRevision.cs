using System.Text.Json;

namespace Ledgerline.Api.Features.Traffic;

/// <summary>
/// One revision of a scorecard's traffic plan. Revisions are appended, never edited; the newest
/// is in force, and every decision records the revision it was made under.
/// </summary>
public sealed class TrafficPlanRevision
{
    public long Id { get; set; }

    public long ScorecardId { get; set; }

    /// <summary>1, 2, 3… per scorecard.</summary>
    public int Revision { get; set; }

    /// <summary>Random salt mixed into the assignment hash; kept per revision so assignment replays.</summary>
    public required string Salt { get; set; }

    public int ChampionVersion { get; set; }

    /// <summary>Challengers as JSON: <c>[{"version":2,"share":0.2}]</c>.</summary>
    public required string Challengers { get; set; }

    /// <summary>Shadow versions as JSON: <c>[3]</c>.</summary>
    public required string Shadows { get; set; }

    public required string Reason { get; set; }

    public required string ChangedBy { get; set; }

    public DateTimeOffset ChangedAt { get; set; }

    public IReadOnlyList<ChallengerShare> ChallengerShares() =>
        JsonSerializer.Deserialize<List<ChallengerShare>>(Challengers, JsonSerializerOptions.Web) ?? [];

    public IReadOnlyList<int> ShadowVersions() =>
        JsonSerializer.Deserialize<List<int>>(Shadows, JsonSerializerOptions.Web) ?? [];

    /// <summary>True when the version plays any role in this revision.</summary>
    public bool Includes(int version) =>
        ChampionVersion == version || ChallengerShares().Any(c => c.Version == version) || ShadowVersions().Contains(version);
}

/// <summary>A challenger and the share of applications it decides.</summary>
public sealed record ChallengerShare(int Version, decimal Share);
