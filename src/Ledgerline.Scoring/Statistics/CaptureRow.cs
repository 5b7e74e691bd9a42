namespace Ledgerline.Scoring.Statistics;

/// <summary>Cumulative capture of bads in the riskiest k groups of equal population share.</summary>
/// <param name="Group">k, from 1 (riskiest share) to the number of groups.</param>
/// <param name="PopulationShare">Share of all decisions in the riskiest k groups, k/groups.</param>
/// <param name="UpperScore">The score at which the k-th group ends (its highest score).</param>
/// <param name="Decisions">Decisions in the riskiest k groups (may be fractional where a tie block is split).</param>
/// <param name="Bads">Bads in the riskiest k groups (may be fractional where a tie block is split).</param>
/// <param name="GroupBadRate">Bad rate within group k alone.</param>
/// <param name="CaptureRate">Share of all bads found in the riskiest k groups.</param>
/// <param name="Lift">CaptureRate / PopulationShare: 1 means no better than random.</param>
public sealed record CaptureRow(
    int Group,
    double PopulationShare,
    double UpperScore,
    double Decisions,
    double Bads,
    double GroupBadRate,
    double CaptureRate,
    double Lift);
