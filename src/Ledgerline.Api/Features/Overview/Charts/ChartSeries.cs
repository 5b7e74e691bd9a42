namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>One data point of a line chart.</summary>
public readonly record struct ChartPoint(double X, double Y);

/// <summary>A named line of points, drawn in its palette colour; dashed lines read apart in grey print.</summary>
public sealed record LineSeries(string Name, IReadOnlyList<ChartPoint> Points, string Colour, bool Dashed = false, bool Markers = false);

/// <summary>A named row of bar values, one per category; null leaves the category empty.</summary>
public sealed record BarSeries(string Name, IReadOnlyList<double?> Values, string Colour);

/// <summary>A horizontal band of the value axis, shaded behind the data (e.g. the PSI 0.10 to 0.25 band).</summary>
public sealed record ChartBand(double From, double To, string Colour, string Label);

/// <summary>One axis: its label, the data interval it shows and how its tick values read.</summary>
public sealed record ChartAxis(string Label, double Min, double Max, Func<double, string> Format, int Ticks = 5);
