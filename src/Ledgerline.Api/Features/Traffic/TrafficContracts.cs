namespace Ledgerline.Api.Features.Traffic;

/// <summary>
/// A new traffic plan. The champion decides for everyone the challengers do not take; shadows
/// score every application and decide for no one.
/// </summary>
/// <param name="Champion">The approved version that decides by default.</param>
/// <param name="Challengers">Approved versions deciding a share of applications each, in (0, 1), summing below 1.</param>
/// <param name="Shadows">Approved versions that only score.</param>
/// <param name="Reason">Why the plan changes; kept with the revision.</param>
/// <param name="Reshuffle">
/// When true, draw a new assignment salt, so every key is assigned afresh. By default the salt is
/// kept from the previous revision, so a key keeps its arm unless a share change moves it.
/// </param>
public sealed record TrafficPlanRequest(
    int? Champion,
    IReadOnlyList<ChallengerShareDocument>? Challengers,
    IReadOnlyList<int>? Shadows,
    string? Reason,
    bool? Reshuffle);

/// <summary>A challenger and the share of applications it decides.</summary>
public sealed record ChallengerShareDocument(int? Version, decimal? Share);

/// <summary>A traffic plan revision as stored.</summary>
/// <param name="Revision">1, 2, 3… per scorecard; decisions record the revision in force.</param>
/// <param name="Champion">The champion version.</param>
/// <param name="ChampionShare">What the champion decides: 1 minus the challengers' shares.</param>
/// <param name="Challengers">Challengers with their shares, in plan order.</param>
/// <param name="Shadows">Shadow versions.</param>
/// <param name="Reason">Why the plan changed.</param>
/// <param name="ChangedBy">The key that made the change.</param>
/// <param name="ChangedAt">When.</param>
public sealed record TrafficPlanResponse(
    int Revision,
    int Champion,
    decimal ChampionShare,
    IReadOnlyList<ChallengerShare> Challengers,
    IReadOnlyList<int> Shadows,
    string Reason,
    string ChangedBy,
    DateTimeOffset ChangedAt);

/// <summary>Every revision of a plan, newest first.</summary>
public sealed record TrafficHistoryResponse(IReadOnlyList<TrafficPlanResponse> Revisions);
