using System.Text.Json;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Outcomes;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>One application to score and log (the wire contract's decision request).</summary>
/// <param name="ApplicationId">The origination system's id of the application, 1–100 characters; one decision per id.</param>
/// <param name="AssignmentKey">What picks the arm instead of the application id, e.g. a customer id so a returning customer sees the same version.</param>
/// <param name="ApplicationDate">yyyy-MM-dd, the date the performance window runs from; defaults to today (UTC), never in the future.</param>
/// <param name="Characteristics">name → number, text or null.</param>
public sealed record DecisionRequest(
    string? ApplicationId,
    string? AssignmentKey,
    string? ApplicationDate,
    Dictionary<string, JsonElement>? Characteristics);

/// <summary>The answer to a decision, exactly as the wire contract fixes it.</summary>
public sealed record DecisionResponse(
    Guid DecisionId,
    string ApplicationId,
    int Version,
    ArmRole Role,
    decimal Score,
    double ProbabilityOfBad,
    Band Decision,
    int PlanRevision,
    IReadOnlyList<ReasonCodeResponse> ReasonCodes,
    IReadOnlyList<UnmatchedValue>? Unmatched = null);

/// <summary>
/// A characteristic of the deciding version whose value no bin lists (its <c>otherPoints</c>
/// applied) or that was missing (its <c>missingPoints</c> applied). Categories are compared
/// exactly: case, spaces and accents count.
/// </summary>
/// <param name="Characteristic">The characteristic's name.</param>
/// <param name="Value">The value sent; absent when it was missing.</param>
/// <param name="Bin"><c>other</c> or <c>missing</c>.</param>
public sealed record UnmatchedValue(string Characteristic, string? Value, string Bin);

/// <summary>Up to <see cref="DecisionsEndpoints.MaxBatchItems"/> applications; each is decided or refused on its own.</summary>
public sealed record DecisionBatchRequest(IReadOnlyList<DecisionRequest?>? Applications);

/// <summary>An answer per item, in request order.</summary>
/// <param name="Decided">Items newly decided (status 201).</param>
/// <param name="Replayed">Items decided before with the same body (status 200, the original decision).</param>
/// <param name="Rejected">Items refused (status 400 or 409); nothing was stored for them.</param>
/// <param name="Results">One per item.</param>
public sealed record DecisionBatchResponse(int Decided, int Replayed, int Rejected, IReadOnlyList<DecisionBatchItem> Results);

/// <summary>The outcome of one batch item.</summary>
/// <param name="Index">The item's position in <c>applications</c>, from 0.</param>
/// <param name="ApplicationId">The item's application id, when it gave one.</param>
/// <param name="Status">201 decided, 200 replay, 400 bad item, 409 refused duplicate.</param>
/// <param name="Decision">The decision, for 201 and 200.</param>
/// <param name="Error">What was wrong and what was expected, for 400 and 409.</param>
public sealed record DecisionBatchItem(int Index, string? ApplicationId, int Status, DecisionResponse? Decision, string? Error);

/// <summary>The full logged record of one decision.</summary>
/// <param name="DecisionId">The decision's id.</param>
/// <param name="ApplicationId">The application.</param>
/// <param name="IdempotencyKey">The idempotency key it was made under (the application id when none was sent).</param>
/// <param name="AssignmentKey">The assignment key, when one was sent.</param>
/// <param name="ApplicationDate">The date the performance window runs from.</param>
/// <param name="DecidedAt">When it was decided.</param>
/// <param name="PlanRevision">The traffic plan revision in force.</param>
/// <param name="Version">The deciding version.</param>
/// <param name="Role">The deciding version's role: <c>champion</c> or <c>challenger</c>.</param>
/// <param name="Score">The deciding score.</param>
/// <param name="ProbabilityOfBad">The deciding version's PD at that score.</param>
/// <param name="Decision">The band: approve, refer or decline.</param>
/// <param name="ReasonCodes">The reason codes as answered.</param>
/// <param name="Characteristics">Each characteristic of the deciding version: matched bin and points.</param>
/// <param name="OtherScores">Every non-deciding version of the plan: its score, or the error that stopped it.</param>
/// <param name="Outcome">The loan's outcome once one was posted.</param>
public sealed record DecisionRecordResponse(
    Guid DecisionId,
    string ApplicationId,
    string IdempotencyKey,
    string? AssignmentKey,
    DateOnly ApplicationDate,
    DateTimeOffset DecidedAt,
    int PlanRevision,
    int Version,
    ArmRole Role,
    decimal Score,
    double ProbabilityOfBad,
    Band Decision,
    IReadOnlyList<ReasonCodeResponse> ReasonCodes,
    IReadOnlyList<CharacteristicScore> Characteristics,
    IReadOnlyList<VersionScoreResponse> OtherScores,
    DecisionOutcomeResponse? Outcome);

/// <summary>How a non-deciding version scored the application.</summary>
/// <param name="Version">The version.</param>
/// <param name="Role"><c>champion</c>, <c>challenger</c> or <c>shadow</c>.</param>
/// <param name="Score">Null when it could not score the input.</param>
/// <param name="ProbabilityOfBad">Its PD at that score.</param>
/// <param name="Decision">The band it would have given.</param>
/// <param name="Characteristics">Matched bins and points.</param>
/// <param name="Error">Why it could not score the input (the decision stands regardless).</param>
public sealed record VersionScoreResponse(
    int Version,
    ArmRole Role,
    decimal? Score,
    double? ProbabilityOfBad,
    Band? Decision,
    IReadOnlyList<CharacteristicScore>? Characteristics,
    string? Error);

/// <summary>The current outcome of a decision and every observation posted for it.</summary>
/// <param name="Status"><c>good</c>, <c>bad</c>, <c>indeterminate</c>, or null while unclassified.</param>
/// <param name="Matured">True once the outcome counts in performance figures.</param>
/// <param name="ObservedAt">The observation date of the current outcome.</param>
/// <param name="Observations">Every observation, oldest first.</param>
public sealed record DecisionOutcomeResponse(PerformanceClass? Status, bool Matured, DateOnly? ObservedAt, IReadOnlyList<OutcomeObservationResponse> Observations);

/// <summary>One posted observation.</summary>
public sealed record OutcomeObservationResponse(DateOnly ObservedAt, int? WorstDaysPastDue, bool? ChargedOff, PerformanceClass? Status, PerformanceClass? Classified, DateTimeOffset ReceivedAt);
