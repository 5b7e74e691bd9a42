namespace Ledgerline.Api.Features.Demo;

/// <summary>The demo scenario's settings (section <c>Demo</c>; <c>--demo</c> on the command line sets <c>Enabled</c>).</summary>
public sealed class DemoOptions
{
    public const string Section = "Demo";

    /// <summary>Load the scenario into an empty database at start.</summary>
    public bool Enabled { get; set; }

    /// <summary>Simulated applications over the whole period.</summary>
    public int Applications { get; set; } = 24_000;

    /// <summary>Whole months of applications, ending with the last month before today's.</summary>
    public int Months { get; set; } = 18;

    /// <summary>Seed of every random draw: the same seed and the same day give the same scenario.</summary>
    public int Seed { get; set; } = 20_261;

    /// <summary>The demo reader key's secret; a random one is made and printed when empty.</summary>
    public string? Key { get; set; }
}
