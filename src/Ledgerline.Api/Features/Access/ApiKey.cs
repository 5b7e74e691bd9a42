namespace Ledgerline.Api.Features.Access;

/// <summary>An API key. Only the SHA-256 of the secret is stored; the secret is shown once.</summary>
public sealed class ApiKey
{
    public Guid Id { get; set; }

    public required string Name { get; set; }

    /// <summary>Hex SHA-256 of the secret. A fast hash suits a 256-bit random secret: there is nothing to brute-force.</summary>
    public required string SecretHash { get; set; }

    /// <summary>Roles, comma separated.</summary>
    public required string Roles { get; set; }

    /// <summary>Scorecard keys this key is limited to, comma separated; null for all.</summary>
    public string? Scorecards { get; set; }

    public DateTimeOffset CreatedAt { get; set; }

    public required string CreatedBy { get; set; }

    public DateTimeOffset? ExpiresAt { get; set; }

    public DateTimeOffset? RevokedAt { get; set; }
}
