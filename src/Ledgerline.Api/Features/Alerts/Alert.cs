namespace Ledgerline.Api.Features.Alerts;

/// <summary>
/// A monitoring condition that crossed its threshold. Raised once: at most one open alert exists per
/// (scorecard, kind, version, subject), enforced by a unique index filtered on open alerts, so two
/// instances evaluating at once cannot both raise it. Closes itself when the condition clears.
/// </summary>
public sealed class Alert
{
    public long Id { get; set; }

    public long ScorecardId { get; set; }

    /// <summary>"psi", "csi", "aucDecline", "hosmerLemeshow" or "sampleRatio".</summary>
    public required string Kind { get; set; }

    public int Version { get; set; }

    /// <summary>What the alert is about within the version: "score", a characteristic, or a plan revision; never null so the unique index holds.</summary>
    public required string Subject { get; set; }

    /// <summary>The period (e.g. "2026-11") or range the figure was computed on.</summary>
    public required string Period { get; set; }

    /// <summary>"amber" or "red" for stability alerts, "red" otherwise.</summary>
    public required string Severity { get; set; }

    public double Figure { get; set; }

    public double Threshold { get; set; }

    /// <summary>Plain words: what was measured, on which population, against what.</summary>
    public required string Evidence { get; set; }

    public DateTimeOffset OpenedAt { get; set; }

    /// <summary>When the figure was last seen beyond the threshold.</summary>
    public DateTimeOffset LastSeenAt { get; set; }

    public DateTimeOffset? ClosedAt { get; set; }
}

/// <summary>
/// One webhook delivery of a new alert (an outbox row written with the alert). A background sender
/// claims due rows, posts them and retries failures with exponential back-off; scoring never waits.
/// </summary>
public sealed class AlertDelivery
{
    public long Id { get; set; }

    public long AlertId { get; set; }

    /// <summary>The JSON body to post.</summary>
    public required string Payload { get; set; }

    public int Attempts { get; set; }

    public DateTimeOffset NextAttemptAt { get; set; }

    /// <summary>A sender holds the row until then; another instance may take it afterwards.</summary>
    public DateTimeOffset? ClaimedUntil { get; set; }

    /// <summary>Raised by every claim; a claim succeeds only against the token it read, so two senders cannot both take a row.</summary>
    public int ClaimToken { get; set; }

    public DateTimeOffset? DeliveredAt { get; set; }

    /// <summary>True when the sender gave up after its last attempt.</summary>
    public bool Abandoned { get; set; }

    public string? LastError { get; set; }
}
