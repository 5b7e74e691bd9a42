using System.Globalization;
using Ledgerline.Api.Features.Overview;
using Ledgerline.Api.Features.Overview.Charts;

namespace Ledgerline.Api.Tests.Overview;

public sealed class ChartPaletteContrastTests
{
    // WCAG 2.1, success criterion 1.4.11 (non-text contrast): graphical objects need a contrast
    // ratio of at least 3:1 against adjacent colours. Relative luminance and contrast ratio are the
    // definitions of WCAG 2.1 ("relative luminance", "contrast ratio"), W3C Recommendation 2018.
    [Fact]
    public void Palette_EveryMarkColour_HasAtLeastThreeToOneContrastAgainstWhatItIsDrawnOn()
    {
        var pairs = ChartPalette.Marks.Select(m => (Mark: m, Background: ChartPalette.Card))
            .Concat(from v in ChartPalette.VersionColours from band in ChartPalette.Bands select (Mark: v, Background: band));
        var failures = (from pair in pairs
                        let mark = pair.Mark
                        let background = pair.Background
                        let ratio = ContrastRatio(mark, background)
                        where ratio < 3.0
                        select $"{mark} on {background}: {ratio:F2}").ToList();

        Assert.True(failures.Count == 0, "below 3:1 — " + string.Join("; ", failures));
    }

    [Fact]
    public void Palette_CardBackground_IsThePageStyleCard() =>
        Assert.Contains($"--card:{ChartPalette.Card}", OverviewStyle.Css, StringComparison.Ordinal);

    [Theory]
    // White on black is the scale's maximum, 21:1; equal colours give 1:1 (WCAG 2.1 definitions).
    [InlineData("#ffffff", "#000000", 21.0)]
    [InlineData("#777777", "#777777", 1.0)]
    // #767676 on white is the commonly quoted lightest grey meeting 4.5:1 (common practice; 4.54 from memory).
    [InlineData("#767676", "#ffffff", 4.54)]
    public void ContrastRatio_KnownPairs(string a, string b, double expected) =>
        Assert.Equal(expected, ContrastRatio(a, b), 2);

    private static double ContrastRatio(string a, string b)
    {
        var (lighter, darker) = (Luminance(a), Luminance(b)) is var (x, y) && x > y ? (x, y) : (Luminance(b), Luminance(a));
        return (lighter + 0.05) / (darker + 0.05);
    }

    private static double Luminance(string hex)
    {
        double Channel(int offset)
        {
            var c = int.Parse(hex.AsSpan(1 + offset, 2), NumberStyles.HexNumber, CultureInfo.InvariantCulture) / 255.0;
            return c <= 0.03928 ? c / 12.92 : Math.Pow((c + 0.055) / 1.055, 2.4);
        }

        return (0.2126 * Channel(0)) + (0.7152 * Channel(2)) + (0.0722 * Channel(4));
    }
}
