namespace Ledgerline.Api.Features.Alerts;

/// <summary>The <c>Alerts</c> configuration section.</summary>
public sealed class AlertOptions
{
    public const string Section = "Alerts";

    /// <summary>Minutes between evaluations of every scorecard by the background job; 0 turns the job off (on-demand evaluation still works).</summary>
    public double IntervalMinutes { get; set; } = 60;

    /// <summary>Where each new alert is posted as JSON; none when empty.</summary>
    public string? WebhookUrl { get; set; }

    /// <summary>Seconds between looks for webhook deliveries that are due.</summary>
    public double WebhookPollSeconds { get; set; } = 5;

    /// <summary>Attempts before a delivery is abandoned.</summary>
    public int WebhookMaxAttempts { get; set; } = 10;

    /// <summary>Wait before the first retry; it doubles after each further failure, up to an hour.</summary>
    public double WebhookFirstRetrySeconds { get; set; } = 2;
}
