namespace Ledgerline.Scoring.Engine;

/// <summary>The words for <see cref="ArmRole"/> values, as reports and answers write them.</summary>
public static class ArmRoleNames
{
    /// <summary>"champion", "challenger" or "shadow".</summary>
    /// <param name="role">The role.</param>
    /// <returns>The word.</returns>
    public static string ToWire(ArmRole role) => role switch
    {
        ArmRole.Champion => "champion",
        ArmRole.Challenger => "challenger",
        ArmRole.Shadow => "shadow",
        _ => throw new ArgumentOutOfRangeException(nameof(role), role, null),
    };
}
