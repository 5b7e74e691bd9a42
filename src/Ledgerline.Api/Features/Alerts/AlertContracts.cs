using Ledgerline.Api.Features.Reports;
namespace Ledgerline.Api.Features.Alerts;

public sealed record AlertResponse(
    long Id,
    string Kind,
    int Version,
    string Subject,
    string Period,
    string Severity,
    double Figure,
    double Threshold,
    string Evidence,
    DateTimeOffset OpenedAt,
    DateTimeOffset LastSeenAt,
    DateTimeOffset? ClosedAt);

public sealed record AlertListResponse(string Scorecard, IReadOnlyList<AlertResponse> Alerts);

public sealed record EvaluationResponse(string Scorecard, DateTimeOffset EvaluatedAt, int Opened, int Closed, IReadOnlyList<AlertResponse> Open);

public sealed record AlertThresholdsRequest(
    double? PsiAmber,
    double? PsiRed,
    double? CsiAmber,
    double? CsiRed,
    double? AucDecline,
    double? HosmerLemeshowP,
    double? SampleRatioP);

public sealed record AlertThresholdsResponse(
    double PsiAmber,
    double PsiRed,
    double CsiAmber,
    double CsiRed,
    double AucDecline,
    double HosmerLemeshowP,
    double SampleRatioP,
    bool Defaults,
    DateTimeOffset? UpdatedAt,
    string? UpdatedBy)
{
    public static AlertThresholdsResponse From(MonitoringThresholds t, bool defaults) =>
        new(t.PsiAmber, t.PsiRed, t.CsiAmber, t.CsiRed, t.AucDecline, t.HosmerLemeshowP, t.SampleRatioP, defaults, t.UpdatedAt, t.UpdatedBy);
}

internal static class AlertMapping
{
    public static AlertResponse ToResponse(this Alert a) =>
        new(a.Id, a.Kind, a.Version, a.Subject, a.Period, a.Severity, a.Figure, a.Threshold, a.Evidence, a.OpenedAt, a.LastSeenAt, a.ClosedAt);
}
