using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;

namespace Ledgerline.Api.Features.Overview.Charts;

/// <summary>
/// Writes one chart's SVG: the frame with its accessible title, grid, ticks, axis labels and
/// legend. Every piece of text goes through the HTML encoder, so names from the database cannot
/// break out of the markup.
/// </summary>
public sealed class SvgCanvas
{
    private readonly StringBuilder _svg = new();

    public SvgCanvas(string id, string title, PlotArea area)
    {
        Area = area;
        _svg.Append(CultureInfo.InvariantCulture,
            $"<svg xmlns=\"http://www.w3.org/2000/svg\" data-chart=\"{Encode(id)}\" viewBox=\"0 0 {N(area.Width)} {N(area.Height)}\" role=\"img\" aria-labelledby=\"{Encode(id)}-title\" font-family=\"inherit\" font-size=\"12\">");
        _svg.Append(CultureInfo.InvariantCulture, $"<title id=\"{Encode(id)}-title\">{Encode(title)}</title>");
    }

    public PlotArea Area { get; }

    public static string Encode(string text) => HtmlEncoder.Default.Encode(text);

    /// <summary>Pixels with one decimal, invariant culture: enough for a crisp line, small markup.</summary>
    public static string N(double value) => Math.Round(value, 1).ToString("0.#", CultureInfo.InvariantCulture);

    public void Raw(string markup) => _svg.Append(markup);

    public void Line(double x1, double y1, double x2, double y2, string colour, double width = 1, string? dash = null) =>
        _svg.Append(CultureInfo.InvariantCulture,
            $"<line x1=\"{N(x1)}\" y1=\"{N(y1)}\" x2=\"{N(x2)}\" y2=\"{N(y2)}\" stroke=\"{colour}\" stroke-width=\"{N(width)}\"{Dash(dash)}/>");

    /// <summary>A rectangle; <paramref name="value"/> marks it as a data bar (not a background band) for readers and tests.</summary>
    public void Rect(double x, double y, double width, double height, string colour, string? label = null, double? value = null)
    {
        var data = value is { } v ? $" data-value=\"{v.ToString("R", CultureInfo.InvariantCulture)}\"" : "";
        _svg.Append(CultureInfo.InvariantCulture, $"<rect x=\"{N(x)}\" y=\"{N(y)}\" width=\"{N(Math.Max(0, width))}\" height=\"{N(Math.Max(0, height))}\" fill=\"{colour}\"{data}");
        _svg.Append(label is null ? "/>" : $"><title>{Encode(label)}</title></rect>");
    }

    public void Circle(double x, double y, double radius, string colour, string? label = null)
    {
        _svg.Append(CultureInfo.InvariantCulture, $"<circle cx=\"{N(x)}\" cy=\"{N(y)}\" r=\"{N(radius)}\" fill=\"{colour}\"");
        _svg.Append(label is null ? "/>" : $"><title>{Encode(label)}</title></circle>");
    }

    public void Path(IEnumerable<(double X, double Y)> pixels, string colour, double width, string? dash, string? seriesName)
    {
        var d = new StringBuilder();
        foreach (var (x, y) in pixels)
        {
            d.Append(d.Length == 0 ? 'M' : 'L').Append(N(x)).Append(',').Append(N(y));
        }

        if (d.Length == 0)
        {
            return;
        }

        var name = seriesName is null ? "" : $" data-series=\"{Encode(seriesName)}\"";
        _svg.Append(CultureInfo.InvariantCulture, $"<path d=\"{d}\" fill=\"none\" stroke=\"{colour}\" stroke-width=\"{N(width)}\" stroke-linejoin=\"round\"{Dash(dash)}{name}/>");
    }

    public void Text(double x, double y, string text, string anchor = "middle", string colour = ChartPalette.Muted, double? rotate = null, string weight = "normal")
    {
        var transform = rotate is { } r ? $" transform=\"rotate({N(r)} {N(x)} {N(y)})\"" : "";
        _svg.Append(CultureInfo.InvariantCulture,
            $"<text x=\"{N(x)}\" y=\"{N(y)}\" text-anchor=\"{anchor}\" fill=\"{colour}\" font-weight=\"{weight}\"{transform}>{Encode(text)}</text>");
    }

    /// <summary>Horizontal grid lines with value labels on the left, and the y axis label turned upright.</summary>
    public void ValueAxis(LinearScale y, ChartAxis axis)
    {
        foreach (var tick in y.Ticks(axis.Ticks))
        {
            var py = y.Map(tick);
            Line(Area.PlotLeft, py, Area.PlotRight, py, ChartPalette.Grid);
            Text(Area.PlotLeft - 6, py + 4, axis.Format(tick), "end");
        }

        Text(16, (Area.PlotTop + Area.PlotBottom) / 2, axis.Label, "middle", ChartPalette.Ink, -90);
    }

    /// <summary>Ticks and labels along the bottom of a numeric x axis, and its label.</summary>
    public void NumericXAxis(LinearScale x, ChartAxis axis)
    {
        foreach (var tick in x.Ticks(axis.Ticks))
        {
            var px = x.Map(tick);
            Line(px, Area.PlotBottom, px, Area.PlotBottom + 5, ChartPalette.Muted);
            Text(px, Area.PlotBottom + 18, axis.Format(tick));
        }

        XLabel(axis.Label);
    }

    public void XLabel(string label) => Text((Area.PlotLeft + Area.PlotRight) / 2, Area.Height - 10, label, "middle", ChartPalette.Ink);

    /// <summary>The plot's frame lines: the x axis at the bottom and the y axis at the left.</summary>
    public void Frame()
    {
        Line(Area.PlotLeft, Area.PlotBottom, Area.PlotRight, Area.PlotBottom, ChartPalette.Ink);
        Line(Area.PlotLeft, Area.PlotTop, Area.PlotLeft, Area.PlotBottom, ChartPalette.Ink);
    }

    /// <summary>
    /// Swatches and names above the plot, left to right, starting a second row where the first
    /// would pass the right edge (a legend cut off at the edge hides what a colour means).
    /// </summary>
    public void Legend(IEnumerable<(string Name, string Colour, bool Dashed)> entries)
    {
        const double rowHeight = 15;
        var x = Area.PlotLeft;
        var y = 12.0;
        foreach (var (name, colour, dashed) in entries)
        {
            var width = 40 + (name.Length * 6.6);
            if (x > Area.PlotLeft && x + width - 12 > Area.Width - 4)
            {
                x = Area.PlotLeft;
                y += rowHeight;
            }

            Line(x, y, x + 22, y, colour, 3, dashed ? "6 3" : null);
            Text(x + 28, y + 4, name, "start", ChartPalette.Ink);
            x += width;
        }
    }

    public override string ToString() => _svg + "</svg>";

    private static string Dash(string? dash) => dash is null ? "" : $" stroke-dasharray=\"{dash}\"";
}
