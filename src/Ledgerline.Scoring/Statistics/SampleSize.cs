namespace Ledgerline.Scoring.Statistics;

/// <summary>Sample size per arm for comparing two bad rates.</summary>
/// <param name="PerArm">Fleiss n per arm (not rounded).</param>
/// <param name="PerArmContinuityCorrected">n with the continuity correction of Fleiss, Tytun &amp; Ury (1980), not rounded.</param>
public sealed record SampleSize(double PerArm, double PerArmContinuityCorrected);
