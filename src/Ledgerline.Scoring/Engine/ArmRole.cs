namespace Ledgerline.Scoring.Engine;

/// <summary>The part a version plays in a traffic plan.</summary>
public enum ArmRole
{
    /// <summary>Decides every application no challenger is assigned; one per plan.</summary>
    Champion = 0,

    /// <summary>Decides the share of applications assigned to it.</summary>
    Challenger = 1,

    /// <summary>Scores every application and decides none.</summary>
    Shadow = 2,
}
