using System.Text.Json.Serialization;
using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Monitoring;
using Ledgerline.Scoring.Scorecards;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Api.Features.Reports;

// Figures that can be undefined are written as null (not left out) so a reader sees the field and
// the reason beside it in "unavailable"; no report ever carries NaN or infinity.

public sealed record PerformanceReport(string Scorecard, string Range, IReadOnlyList<VersionPerformance> Versions);

public sealed record VersionPerformance(
    int Version,
    long Decisions,
    long Approved,
    long Matured,
    long Bads,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? BadRate,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Auc,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] ConfidenceInterval? AucConfidenceInterval,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Gini,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Ks,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] decimal? KsScore,
    string Population,
    long Indeterminate,
    long Immature,
    IReadOnlyList<RoleVolume> Roles,
    BandRates OwnBands,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? AucStandardError,
    IReadOnlyList<ScoreBinRow> ScoreDistribution,
    string ScoreBins,
    IReadOnlyList<CaptureRow> CaptureAndLift,
    IReadOnlyList<CalibrationRow> Calibration,
    HosmerLemeshowFigure HosmerLemeshow,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? BrierScore,
    RankOrdering RankOrdering,
    DevelopmentComparison? Development,
    IReadOnlyDictionary<string, string> Unavailable);

/// <summary>Applications a version scored in one role; deciding tells whether its band was the decision.</summary>
public sealed record RoleVolume(ArmRole Role, bool Deciding, long Decisions);

/// <summary>Shares of applications by the version's own band (what it decided or would have decided).</summary>
public sealed record BandRates(double? Approve, double? Refer, double? Decline, string Population);

/// <summary>Applications per score bin; <c>upTo</c> is the inclusive upper edge (null on the last bin).</summary>
public sealed record ScoreBinRow(decimal? UpTo, long Count, double? Share);

public sealed record CalibrationRow(
    decimal? UpTo,
    long Matured,
    long Bads,
    double? ExpectedProbabilityOfBad,
    double? ObservedBadRate,
    double? JeffreysP,
    double? BinomialP,
    TrafficLight Status);

public sealed record HosmerLemeshowFigure(
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Statistic,
    int DegreesOfFreedom,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? PValue,
    int Groups,
    string DegreesOfFreedomRule,
    string? Reason);

public sealed record RankOrdering(
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] bool? Monotone,
    IReadOnlyList<decimal?> Reversals,
    string Rule,
    string? Reason);

public sealed record DevelopmentComparison(
    long SampleSize,
    double? BadRate,
    double? Auc,
    double? Gini,
    double? Ks,
    decimal? KsScore,
    AucDeclineTest? AucDeclineTest,
    string? Reason);

public sealed record ComparisonReport(
    string Scorecard,
    string Range,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] ComparedVersion? Champion,
    IReadOnlyList<ChallengerComparison> Challengers,
    IReadOnlyList<SampleRatioCheck> SampleRatio,
    string? Reason);

/// <summary>Figures of one version in a comparison: on its paired population and on its own arm.</summary>
public sealed record ComparedVersion(
    int Version,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Auc,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] ConfidenceInterval? AucConfidenceInterval,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Gini,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Ks,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] decimal? KsScore,
    long Matured,
    long Bads,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? BadRate,
    string Population,
    ArmFigures Arm);

/// <summary>What happened to the applications a version decided (its arm).</summary>
public sealed record ArmFigures(
    long Decisions,
    long Approved,
    double? ApprovalRate,
    long Matured,
    long Bads,
    double? BadRate,
    double? Auc,
    string Population);

public sealed record ChallengerComparison(
    int Version,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Auc,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? AucDifference,
    PairedTestFigure PairedTest,
    UnpairedTestFigure UnpairedTest,
    string Verdict,
    string VerdictRule,
    ComparedVersion Figures,
    ProportionDifference ApprovalRateDifference,
    ProportionDifference BadRateDifference,
    IReadOnlyList<SwapCell> SwapSet,
    PowerFigure Power);

public sealed record PairedTestFigure(
    long N,
    long Goods,
    long Bads,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Z,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? PValue,
    ConfidenceInterval? DifferenceConfidenceInterval,
    string Population,
    string? Reason);

public sealed record UnpairedTestFigure(
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Z,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? PValue,
    double? DegreesOfFreedom,
    string Method,
    string Population,
    string? Reason);

/// <summary>Challenger minus champion, with the pooled two-proportion z-test.</summary>
public sealed record ProportionDifference(
    double? Challenger,
    double? Champion,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Difference,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Z,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? PValue,
    string Population,
    string? Reason);

/// <summary>Applications by the champion's band and the challenger's band, with observed bad rates where outcomes exist.</summary>
public sealed record SwapCell(Band Champion, Band Challenger, long Count, long Matured, long Bads, double? BadRate, string Observed);

public sealed record PowerFigure(
    long? MaturedNeededPerArmForAuc,
    long? AdditionalMaturedNeededForAuc,
    long? MaturedNeededPerArmForBadRate,
    long? AdditionalMaturedNeededForBadRate,
    string Method,
    IReadOnlyList<string> Reasons);

public sealed record SampleRatioCheck(
    int PlanRevision,
    IReadOnlyList<ArmShare> Arms,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? ChiSquare,
    int DegreesOfFreedom,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? PValue,
    string? Reason);

public sealed record ArmShare(int Version, ArmRole Role, double PlannedShare, long Decisions, double? RealisedShare);

public sealed record StabilityReport(
    string Scorecard,
    int Version,
    bool Available,
    string? Reason,
    string Period,
    string Range,
    string Population,
    string EmptyBinRule,
    StabilityThresholdsFigure Thresholds,
    IReadOnlyList<StabilityPeriod> Periods);

public sealed record StabilityThresholdsFigure(double PsiAmber, double PsiRed, double CsiAmber, double CsiRed);

public sealed record StabilityPeriod(
    string Period,
    long N,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Psi,
    StabilityStatus? Status,
    IReadOnlyList<CharacteristicStability> Characteristics,
    string? Reason);

public sealed record CharacteristicStability(
    string Name,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.Never)] double? Csi,
    StabilityStatus? Status,
    double? MissingShare,
    double? DevelopmentMissingShare,
    string? Reason);

/// <summary>Applications of one month by where their outcome stands.</summary>
public sealed record CohortMaturity(string Month, long NotApproved, long MaturedGood, long MaturedBad, long MaturedIndeterminate, long Immature)
{
    public long Total => NotApproved + MaturedGood + MaturedBad + MaturedIndeterminate + Immature;
}
