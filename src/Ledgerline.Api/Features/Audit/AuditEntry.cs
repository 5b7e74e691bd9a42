namespace Ledgerline.Api.Features.Audit;

/// <summary>One appended record of a state change: who, when, what, and the SHA-256 of the changed content.</summary>
public sealed class AuditEntry
{
    public long Id { get; set; }

    public DateTimeOffset At { get; set; }

    public required string Actor { get; set; }

    /// <summary>What happened, e.g. <c>version.registered</c>, <c>traffic.changed</c>.</summary>
    public required string Action { get; set; }

    /// <summary>What it happened to, e.g. <c>personal-loan-application/versions/2</c>.</summary>
    public required string Subject { get; set; }

    /// <summary>Hex SHA-256 of the changed content as JSON.</summary>
    public required string ContentHash { get; set; }
}
