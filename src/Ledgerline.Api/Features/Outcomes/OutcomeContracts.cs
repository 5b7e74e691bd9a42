using Ledgerline.Scoring.Engine;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>The answer to a posted batch: how many rows were stored and every row that was not.</summary>
/// <param name="Accepted">Rows stored.</param>
/// <param name="Rejected">Every row not stored, in body order.</param>
public sealed record RecordOutcomesResponse(int Accepted, IReadOnlyList<RejectedOutcome> Rejected);

/// <summary>One row that was not stored, and why.</summary>
/// <param name="Index">0-based position in the <c>outcomes</c> array, or 0-based data row of a CSV (the header is not counted).</param>
/// <param name="ApplicationId">The row's application id, when it had one.</param>
/// <param name="Error">What is wrong and what was expected.</param>
public sealed record RejectedOutcome(int Index, string? ApplicationId, string Error);

/// <summary>Which decisions of a scorecard have outcomes and which have matured, per deciding version and role.</summary>
/// <param name="Scorecard">The scorecard key.</param>
/// <param name="AsOf">Today (UTC), the date the windows are measured against.</param>
/// <param name="PerformanceWindowMonths">The window of the scorecard's outcome definition.</param>
/// <param name="Versions">One entry per deciding version and role.</param>
public sealed record MaturityResponse(string Scorecard, DateOnly AsOf, int PerformanceWindowMonths, IReadOnlyList<VersionMaturity> Versions);

/// <summary>
/// Maturity of the decisions one version made in one role. <c>Matured</c> = <c>Bad</c> + <c>Good</c> +
/// <c>Indeterminate</c>; <c>Immature</c> = <c>Decided</c> − <c>Matured</c>.
/// </summary>
/// <param name="Version">The deciding version.</param>
/// <param name="Role">The role it decided in.</param>
/// <param name="Decided">Decisions it made.</param>
/// <param name="Approved">Of those, decisions in the approve band.</param>
/// <param name="WithOutcome">Decisions with at least one outcome posted.</param>
/// <param name="Matured">Decisions whose outcome is final: bad inside the window, or observed on or after the window end.</param>
/// <param name="Bad">Matured bad.</param>
/// <param name="Good">Matured good.</param>
/// <param name="Indeterminate">Matured indeterminate.</param>
/// <param name="Immature">Decisions not matured; they never enter performance figures.</param>
/// <param name="WindowEndedAwaitingOutcome">Immature decisions whose window has already ended: an outcome observed on or after the window end would mature them.</param>
/// <param name="NextMaturityDate">The earliest window end, today or later, of an immature decision: the date from which the next cohort can mature. Null when none is waiting.</param>
public sealed record VersionMaturity(
    int Version,
    ArmRole Role,
    int Decided,
    int Approved,
    int WithOutcome,
    int Matured,
    int Bad,
    int Good,
    int Indeterminate,
    int Immature,
    int WindowEndedAwaitingOutcome,
    DateOnly? NextMaturityDate);
