namespace Ledgerline.Api.Features.Scorecards;

/// <summary>A new scorecard family.</summary>
/// <param name="Key">URL-safe slug, e.g. <c>personal-loan-application</c>; never changes.</param>
/// <param name="Name">Display name.</param>
/// <param name="OutcomeDefinition">How loan performance is classified for every version.</param>
public sealed record CreateScorecardRequest(string Key, string Name, OutcomeDefinition? OutcomeDefinition);

/// <summary>
/// Bad at or beyond <paramref name="BadDaysPastDue"/> (or charged off); indeterminate from
/// <paramref name="IndeterminateDaysPastDue"/> up to the bad threshold; otherwise good once
/// <paramref name="PerformanceWindowMonths"/> have elapsed since the application date.
/// </summary>
public sealed record OutcomeDefinition(int? BadDaysPastDue, int? IndeterminateDaysPastDue, int? PerformanceWindowMonths);

/// <summary>A scorecard family with its versions in brief.</summary>
public sealed record ScorecardResponse(
    string Key,
    string Name,
    OutcomeDefinition OutcomeDefinition,
    DateTimeOffset CreatedAt,
    string CreatedBy,
    IReadOnlyList<VersionSummary> Versions);

/// <summary>A version in brief.</summary>
public sealed record VersionSummary(int Version, string Status, string ContentHash, bool HasBaseline);
