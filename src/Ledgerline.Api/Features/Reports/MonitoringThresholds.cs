namespace Ledgerline.Api.Features.Reports;

/// <summary>
/// A scorecard's alert thresholds. A scorecard without a row uses <see cref="Defaults"/>: PSI and CSI
/// amber 0.10 / red 0.25 (common practice), AUC more than 0.05 below development, Hosmer–Lemeshow
/// p below 0.01, sample-ratio p below 0.001.
/// </summary>
public sealed class MonitoringThresholds
{
    public long ScorecardId { get; set; }

    public double PsiAmber { get; set; }

    public double PsiRed { get; set; }

    public double CsiAmber { get; set; }

    public double CsiRed { get; set; }

    /// <summary>Alert when the live AUC is more than this below the development AUC.</summary>
    public double AucDecline { get; set; }

    /// <summary>Alert when the Hosmer–Lemeshow p-value is below this.</summary>
    public double HosmerLemeshowP { get; set; }

    /// <summary>Alert when the sample-ratio test's p-value is below this.</summary>
    public double SampleRatioP { get; set; }

    public DateTimeOffset? UpdatedAt { get; set; }

    public string? UpdatedBy { get; set; }

    public static MonitoringThresholds Defaults(long scorecardId) => new()
    {
        ScorecardId = scorecardId,
        PsiAmber = 0.10,
        PsiRed = 0.25,
        CsiAmber = 0.10,
        CsiRed = 0.25,
        AucDecline = 0.05,
        HosmerLemeshowP = 0.01,
        SampleRatioP = 0.001,
    };
}
