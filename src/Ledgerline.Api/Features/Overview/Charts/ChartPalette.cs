namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>Our colours: distinct in colour, and in print distinct by dash pattern and shade.</summary>
public static class ChartPalette
{
    public const string Ink = "#1d2433";
    public const string Grid = "#d9dde5";
    public const string Muted = "#6b7385";
    public const string Champion = "#22577a";
    public const string Challenger = "#e07a1f";
    public const string Shadow = "#7b6bb0";
    public const string Baseline = "#9aa3b5";
    public const string Good = "#3a8f6b";
    public const string Bad = "#c2410c";
    public const string Pending = "#c9cfdb";
    public const string AmberBand = "#fbe7c2";
    public const string RedBand = "#f7d0c8";
    public const string GreenBand = "#dff0e6";

    private static readonly string[] Versions = [Champion, Challenger, Shadow, "#2a9d8f", "#b5179e"];

    /// <summary>The colour of the i-th version shown (champion first).</summary>
    public static string ForIndex(int index) => Versions[index % Versions.Length];
}
