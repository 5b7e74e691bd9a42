namespace Ledgerline.Scoring.Scorecards;

/// <summary>The wire words for <see cref="Decision"/> values.</summary>
public static class DecisionNames
{
    /// <summary>"approve", "refer" or "decline".</summary>
    public static string ToWire(Decision decision) => decision switch
    {
        Decision.Approve => "approve",
        Decision.Refer => "refer",
        Decision.Decline => "decline",
        _ => throw new ArgumentOutOfRangeException(nameof(decision), decision, null),
    };

    /// <summary>Parses a wire word; false for anything else.</summary>
    public static bool TryParse(string? text, out Decision decision)
    {
        switch (text)
        {
            case "approve": decision = Decision.Approve; return true;
            case "refer": decision = Decision.Refer; return true;
            case "decline": decision = Decision.Decline; return true;
            default: decision = default; return false;
        }
    }
}
