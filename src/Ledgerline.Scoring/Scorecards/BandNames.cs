namespace Ledgerline.Scoring.Scorecards;

/// <summary>The wire words for <see cref="Band"/> values.</summary>
public static class BandNames
{
    /// <summary>"approve", "refer" or "decline".</summary>
    public static string ToWire(Band band) => band switch
    {
        Band.Approve => "approve",
        Band.Refer => "refer",
        Band.Decline => "decline",
        _ => throw new ArgumentOutOfRangeException(nameof(band), band, null),
    };

    /// <summary>Parses a wire word; false for anything else.</summary>
    public static bool TryParse(string? text, out Band band)
    {
        switch (text)
        {
            case "approve": band = Band.Approve; return true;
            case "refer": band = Band.Refer; return true;
            case "decline": band = Band.Decline; return true;
            default: band = default; return false;
        }
    }
}
