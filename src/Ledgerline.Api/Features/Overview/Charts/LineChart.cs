namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>A chart of lines over two numeric axes (ROC, KS, calibration).</summary>
public sealed record LineChart(string Id, string Title, ChartAxis X, ChartAxis Y, IReadOnlyList<LineSeries> Series)
{
    /// <summary>Draws the line of no discrimination from (min, min) to (max, max), as on a ROC chart.</summary>
    public bool Diagonal { get; init; }

    public IReadOnlyList<ChartBand> Bands { get; init; } = [];

    public PlotArea Area { get; init; } = PlotArea.Standard;

    public string Render()
    {
        var canvas = new SvgCanvas(Id, Title, Area);
        var x = Area.XScale(X.Min, X.Max);
        var y = Area.YScale(Y.Min, Y.Max);
        foreach (var band in Bands)
        {
            var top = y.Map(Math.Min(band.To, Y.Max));
            var bottom = y.Map(Math.Max(band.From, Y.Min));
            canvas.Rect(Area.PlotLeft, top, Area.PlotRight - Area.PlotLeft, bottom - top, band.Colour, band.Label);
        }

        canvas.ValueAxis(y, Y);
        canvas.NumericXAxis(x, X);
        canvas.Frame();
        if (Diagonal)
        {
            canvas.Line(x.Map(X.Min), y.Map(Y.Min), x.Map(X.Max), y.Map(Y.Max), ChartPalette.Baseline, 1, "4 4");
        }

        foreach (var series in Series)
        {
            var pixels = series.Points.Select(p => (x.Map(p.X), y.Map(p.Y))).ToList();
            canvas.Path(pixels, series.Colour, 2.5, series.Dashed ? "7 4" : null, series.Name);
            if (series.Markers)
            {
                foreach (var (point, (px, py)) in series.Points.Zip(pixels))
                {
                    canvas.Circle(px, py, 3.5, series.Colour, $"{series.Name}: {X.Format(point.X)}, {Y.Format(point.Y)}");
                }
            }
        }

        canvas.Legend(Series.Select(s => (s.Name, s.Colour, s.Dashed)));
        return canvas.ToString();
    }
}
