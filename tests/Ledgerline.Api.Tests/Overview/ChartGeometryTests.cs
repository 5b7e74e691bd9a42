using System.Globalization;
using System.Xml.Linq;
using Ledgerline.Api.Features.Overview.Charts;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Api.Tests.Overview;

public sealed class ChartGeometryTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";
    private static readonly Func<double, string> Plain = v => v.ToString(CultureInfo.InvariantCulture);

    [Fact]
    public void LinearScale_DomainEnds_MapToRangeEnds()
    {
        var scale = new LinearScale(500, 700, 64, 544);

        Assert.Equal(64, scale.Map(500), 9);
        Assert.Equal(544, scale.Map(700), 9);
        Assert.Equal(304, scale.Map(600), 9);
    }

    [Fact]
    public void LinearScale_ReversedRange_PutsMinimumAtTheBottom()
    {
        var y = PlotArea.Standard.YScale(0, 1);

        Assert.Equal(PlotArea.Standard.PlotBottom, y.Map(0), 9);
        Assert.Equal(PlotArea.Standard.PlotTop, y.Map(1), 9);
        Assert.True(y.Map(0.75) < y.Map(0.25), "a larger value must sit higher, i.e. at a smaller SVG y");
    }

    [Fact]
    public void LinearScale_EmptyDomain_MapsToTheMiddle()
    {
        var scale = new LinearScale(3, 3, 0, 100);

        Assert.Equal(50, scale.Map(3), 9);
    }

    [Fact]
    public void Ticks_UnitInterval_AreSteppedByOneFifth()
    {
        var ticks = new LinearScale(0, 1, 0, 100).Ticks(5);

        Assert.Equal([0, 0.2, 0.4, 0.6, 0.8, 1], ticks.Select(t => Math.Round(t, 12)));
    }

    [Fact]
    public void Ticks_DomainBelowZero_NeverGivesNegativeZero()
    {
        var ticks = new LinearScale(-0.3, 0.3, 0, 100).Ticks(6);

        Assert.Contains(ticks, t => t == 0);
        Assert.DoesNotContain(ticks, t => t == 0 && double.IsNegative(t));
    }

    [Fact]
    public void NiceDomain_RaggedScores_WidensToRoundEnds()
    {
        var (min, max) = LinearScale.NiceDomain(512.3, 688.9, 6);

        Assert.Equal(500, min, 9);
        Assert.Equal(700, max, 9);
    }

    [Fact]
    public void LineChart_RocCurve_RunsFromOriginToTopRightCorner()
    {
        // Goods and bads of methods check 2.1 (AUC 0.883333, pROC 1.18.0 / R 4.2.2).
        double[] goods = [620, 640, 655, 660, 670, 680, 690, 700, 710, 720];
        double[] bads = [580, 600, 610, 630, 650, 665];
        var roc = Roc.Compute(new ScoreHistogram(goods.Select(g => new ScoreCount(g, 1, 0)).Concat(bads.Select(b => new ScoreCount(b, 0, 1)))));
        var chart = new LineChart("roc", "ROC", new ChartAxis("x", 0, 1, Plain), new ChartAxis("y", 0, 1, Plain),
            [new LineSeries("v1", roc.Points.Select(p => new ChartPoint(p.FalsePositiveRate, p.TruePositiveRate)).ToList(), ChartPalette.Champion)]);

        var points = PathPoints(XDocument.Parse(chart.Render()).Descendants(Svg + "path").Single(p => p.Attribute("data-series")?.Value == "v1"));

        var area = PlotArea.Standard;
        Assert.Equal((area.PlotLeft, area.PlotBottom), points[0]);
        Assert.Equal((area.PlotRight, area.PlotTop), points[^1]);
        Assert.True(points.Zip(points.Skip(1)).All(pair => pair.Second.X >= pair.First.X && pair.Second.Y <= pair.First.Y),
            "a ROC curve never turns back: x never decreases and y never falls");
    }

    [Fact]
    public void BarChart_HalfOfTheAxis_FillsHalfThePlotHeight()
    {
        var chart = new BarChart("bars", "Bars", "category", ["a", "b"], new ChartAxis("share", 0, 1, Plain),
            [new BarSeries("s", [0.5, 1.0], ChartPalette.Champion)]);

        var bars = XDocument.Parse(chart.Render()).Descendants(Svg + "rect").Where(r => r.Attribute("data-value") is not null).ToList();

        var plotHeight = PlotArea.Standard.PlotBottom - PlotArea.Standard.PlotTop;
        Assert.Equal(2, bars.Count);
        Assert.Equal(plotHeight / 2, Number(bars[0], "height"), 1);
        Assert.Equal(plotHeight, Number(bars[1], "height"), 1);
        Assert.Equal(PlotArea.Standard.PlotBottom, Number(bars[0], "y") + Number(bars[0], "height"), 1);
    }

    [Fact]
    public void BarChart_Stacked_PutsTheSecondSeriesOnTopOfTheFirst()
    {
        var chart = new BarChart("stack", "Stack", "category", ["a"], new ChartAxis("n", 0, 10, Plain),
            [new BarSeries("lower", [4], ChartPalette.Good), new BarSeries("upper", [6], ChartPalette.Bad)])
        { Stacked = true };

        var bars = XDocument.Parse(chart.Render()).Descendants(Svg + "rect").Where(r => r.Attribute("data-value") is not null).ToList();

        Assert.Equal(Number(bars[0], "y"), Number(bars[1], "y") + Number(bars[1], "height"), 1);
        Assert.Equal(PlotArea.Standard.PlotTop, Number(bars[1], "y"), 1);
    }

    [Fact]
    public void Render_NamesWithMarkup_AreEncodedAndTheSvgStaysWellFormed()
    {
        var chart = new LineChart("x<y", "Title <script>alert(1)</script>", new ChartAxis("a & b", 0, 1, Plain), new ChartAxis("c", 0, 1, Plain),
            [new LineSeries("</svg><script>", [new(0, 0), new(1, 1)], ChartPalette.Champion)]);

        var svg = chart.Render();
        var document = XDocument.Parse(svg);

        Assert.DoesNotContain("<script", svg, StringComparison.OrdinalIgnoreCase);
        Assert.Equal("Title <script>alert(1)</script>", document.Root!.Element(Svg + "title")!.Value);
    }

    [Fact]
    public void Render_EveryChart_CarriesAnAccessibleTitleAndAxisLabels()
    {
        var chart = new LineChart("ks", "KS curves", new ChartAxis("Score", 500, 700, Plain), new ChartAxis("Separation", 0, 1, Plain),
            [new LineSeries("v1", [new(500, 0), new(600, 0.4), new(700, 0)], ChartPalette.Champion)]);

        var document = XDocument.Parse(chart.Render());

        Assert.Equal("KS curves", document.Root!.Element(Svg + "title")!.Value);
        Assert.Equal("img", document.Root.Attribute("role")!.Value);
        var texts = document.Descendants(Svg + "text").Select(t => t.Value).ToList();
        Assert.Contains("Score", texts);
        Assert.Contains("Separation", texts);
    }

    private static List<(double X, double Y)> PathPoints(XElement path) =>
        path.Attribute("d")!.Value.Split(['M', 'L'], StringSplitOptions.RemoveEmptyEntries)
            .Select(p => p.Split(','))
            .Select(p => (double.Parse(p[0], CultureInfo.InvariantCulture), double.Parse(p[1], CultureInfo.InvariantCulture)))
            .ToList();

    private static double Number(XElement element, string attribute) => double.Parse(element.Attribute(attribute)!.Value, CultureInfo.InvariantCulture);
}
