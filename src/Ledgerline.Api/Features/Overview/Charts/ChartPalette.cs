namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>
/// Our colours: distinct in colour, and in print distinct by dash pattern and shade. Every mark
/// colour keeps a contrast of at least 3:1 (WCAG 2.1, non-text contrast) against the card it is
/// drawn on and against the threshold bands behind the stability bars (ChartPaletteContrastTests).
/// </summary>
public static class ChartPalette
{
    /// <summary>The panels' background (the page style's <c>--card</c>).</summary>
    public const string Card = "#fffdf8";
    public const string Ink = "#1d2433";
    public const string Grid = "#d9dde5";
    public const string Muted = "#6b7385";
    public const string Champion = "#22577a";
    public const string Challenger = "#b85c00";
    public const string Shadow = "#7b6bb0";
    public const string Baseline = "#737d92";
    public const string Good = "#2f7d5b";
    public const string Bad = "#c2410c";
    public const string Pending = "#5f84b3";
    public const string Refer = "#a66a10";
    public const string NotApproved = "#7d828c";
    public const string AmberBand = "#fbe7c2";
    public const string RedBand = "#f7d0c8";
    public const string GreenBand = "#dff0e6";

    private static readonly string[] Versions = [Champion, Challenger, Shadow, "#238276", "#b5179e"];

    /// <summary>Colours of marks (lines, bars, swatches) drawn on the card.</summary>
    public static IReadOnlyList<string> Marks { get; } = [.. Versions, Baseline, Good, Bad, Pending, Refer, NotApproved];

    /// <summary>The stability charts' threshold bands, which only the versions' bars are drawn over.</summary>
    public static IReadOnlyList<string> Bands { get; } = [AmberBand, RedBand, GreenBand];

    /// <summary>The versions' colours in plan order.</summary>
    public static IReadOnlyList<string> VersionColours => Versions;


    /// <summary>The colour of the i-th version shown (champion first).</summary>
    public static string ForIndex(int index) => Versions[index % Versions.Length];
}
