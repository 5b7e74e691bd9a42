namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>
/// Bars per category, side by side per series or stacked (distributions, PSI per period, swap
/// set, cohort maturity). Categories are spread evenly along the x axis.
/// </summary>
public sealed record BarChart(string Id, string Title, string CategoryLabel, IReadOnlyList<string> Categories, ChartAxis Y, IReadOnlyList<BarSeries> Series)
{
    public bool Stacked { get; init; }

    public IReadOnlyList<ChartBand> Bands { get; init; } = [];

    public PlotArea Area { get; init; } = PlotArea.Standard;

    /// <summary>Show every n-th category label, so long period lists stay legible.</summary>
    public int LabelEvery { get; init; } = 1;

    public string Render()
    {
        var canvas = new SvgCanvas(Id, Title, Area);
        var y = Area.YScale(Y.Min, Y.Max);
        foreach (var band in Bands)
        {
            var top = y.Map(Math.Min(band.To, Y.Max));
            var bottom = y.Map(Math.Max(band.From, Y.Min));
            canvas.Rect(Area.PlotLeft, top, Area.PlotRight - Area.PlotLeft, bottom - top, band.Colour, band.Label);
        }

        canvas.ValueAxis(y, Y);
        var slot = (Area.PlotRight - Area.PlotLeft) / Math.Max(1, Categories.Count);
        var groupWidth = slot * 0.78;
        var barWidth = Stacked ? groupWidth : groupWidth / Math.Max(1, Series.Count);

        // Labels wider than their slot are turned, so long characteristic names do not run into each other.
        var rotate = Categories.Where((_, i) => i % LabelEvery == 0).Any(c => c.Length * 6.6 > slot * LabelEvery);
        for (var c = 0; c < Categories.Count; c++)
        {
            var groupLeft = Area.PlotLeft + (c * slot) + ((slot - groupWidth) / 2);
            var stackBase = 0.0;
            for (var s = 0; s < Series.Count; s++)
            {
                if (Series[s].Values[c] is not { } value)
                {
                    continue;
                }

                var from = Stacked ? stackBase : Math.Max(Y.Min, 0);
                var to = from + value;
                stackBase = Stacked ? to : stackBase;
                var left = Stacked ? groupLeft : groupLeft + (s * barWidth);
                var top = y.Map(Math.Min(Math.Max(from, to), Y.Max));
                var bottom = y.Map(Math.Min(from, to));
                canvas.Rect(left, top, barWidth - (Stacked ? 0 : 1), bottom - top, Series[s].Colour,
                    $"{Categories[c]}, {Series[s].Name}: {Y.Format(value)}", value);
            }

            if (c % LabelEvery == 0)
            {
                var x = Area.PlotLeft + (c * slot) + (slot / 2);
                if (rotate)
                {
                    canvas.Text(x + 4, Area.PlotBottom + 14, Categories[c], "end", rotate: -35);
                }
                else
                {
                    canvas.Text(x, Area.PlotBottom + 18, Categories[c]);
                }
            }
        }

        canvas.Frame();
        canvas.XLabel(CategoryLabel);
        canvas.Legend(Series.Select(s => (s.Name, s.Colour, false)));
        return canvas.ToString();
    }
}
