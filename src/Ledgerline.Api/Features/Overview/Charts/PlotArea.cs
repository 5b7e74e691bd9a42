namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>The drawing surface: the SVG size and the margins left for axes, labels and legend.</summary>
public sealed record PlotArea(double Width, double Height, double Left, double Right, double Top, double Bottom)
{
    public static PlotArea Standard { get; } = new(560, 340, 64, 16, 40, 52);

    public double PlotLeft => Left;

    public double PlotRight => Width - Right;

    public double PlotTop => Top;

    public double PlotBottom => Height - Bottom;

    /// <summary>Data x to pixels: minimum at the left edge of the plot, maximum at the right.</summary>
    public LinearScale XScale(double min, double max) => new(min, max, PlotLeft, PlotRight);

    /// <summary>Data y to pixels: minimum at the bottom of the plot, maximum at the top.</summary>
    public LinearScale YScale(double min, double max) => new(min, max, PlotBottom, PlotTop);
}
