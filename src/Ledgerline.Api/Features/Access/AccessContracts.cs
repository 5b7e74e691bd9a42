namespace Ledgerline.Api.Features.Access;

/// <summary>A new API key.</summary>
/// <param name="Name">Who or what will use the key (e.g. "origination-eu").</param>
/// <param name="Roles">Any of scoring, outcomes, analyst, risk, admin.</param>
/// <param name="Scorecards">Limit the key to these scorecard keys; omit for all.</param>
/// <param name="ExpiresAt">When the key stops working; omit for never.</param>
public sealed record CreateKeyRequest(string Name, IReadOnlyList<string> Roles, IReadOnlyList<string>? Scorecards, DateTimeOffset? ExpiresAt);

/// <summary>The created key; <paramref name="Key"/> is shown this once and stored only as a hash.</summary>
public sealed record CreatedKeyResponse(Guid Id, string Key);

/// <summary>A key as listed (never the secret).</summary>
public sealed record KeyResponse(
    Guid Id,
    string Name,
    IReadOnlyList<string> Roles,
    IReadOnlyList<string>? Scorecards,
    DateTimeOffset CreatedAt,
    string CreatedBy,
    DateTimeOffset? ExpiresAt,
    DateTimeOffset? RevokedAt);
