using Ledgerline.Api.Features.Overview.Charts;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Overview;

/// <summary>Each chart of the overview with the table of its numbers.</summary>
public static class OverviewCharts
{
    private static readonly Func<double, string> Share = v => Figures.Percent(v, 0);
    private static readonly Func<double, string> Plain = v => Figures.Score(v);

    // Room on the right for the "100%" label centred on the last tick.
    private static readonly PlotArea ShareArea = PlotArea.Standard with { Right = 28 };

    /// <summary>The chart panels in page order.</summary>
    public static IReadOnlyList<ChartSection> All(OverviewData data)
    {
        List<ChartSection> sections = [Roc(data), Ks(data)];
        sections.AddRange(SwapSets(data));
        sections.AddRange(Capture(data));
        sections.AddRange(Calibration(data));
        sections.Add(Psi(data));
        if (Csi(data) is { } csi)
        {
            sections.Add(csi);
        }

        sections.AddRange(Distributions(data));
        sections.Add(Maturity(data));
        return sections;
    }

    public static ChartSection Roc(OverviewData data)
    {
        var series = data.Versions.Where(v => v.Roc.Points.Count > 0)
            .Select((v, i) => new LineSeries(v.Label, v.Roc.Points.Select(p => new ChartPoint(p.FalsePositiveRate, p.TruePositiveRate)).ToList(), v.Colour, Dashed: v.Role == "shadow"))
            .ToList();
        var chart = new LineChart("roc", "ROC curves: share of bads against share of goods below each cut-off",
            new ChartAxis("Share of goods at or below the cut-off", 0, 1, Share),
            new ChartAxis("Share of bads at or below the cut-off", 0, 1, Share),
            series)
        { Diagonal = true, Area = ShareArea };
        var table = new FigureTable("AUC per version (95% confidence interval by DeLong)", "Version", "AUC", "95% CI", "Gini", "Goods", "Bads");
        foreach (var v in data.Versions)
        {
            table.Row(v.Label, Figures.Number(v.Roc.Auc), v.Roc.ConfidenceInterval is { } ci ? $"{Figures.Number(ci.Lower)}–{Figures.Number(ci.Upper)}" : Figures.None,
                Figures.Number(v.Roc.Gini), Figures.Count(v.Roc.Goods), Figures.Count(v.Roc.Bads));
        }

        return new ChartSection("roc", "Discrimination: ROC curves", PerformancePopulation(data), chart.Render(), table);
    }

    public static ChartSection Ks(OverviewData data)
    {
        var withPoints = data.Versions.Where(v => v.Ks.Points.Count > 0).ToList();
        var scores = withPoints.SelectMany(v => v.Ks.Points.Select(p => p.Score)).DefaultIfEmpty(0).ToList();
        var (min, max) = Charts.LinearScale.NiceDomain(scores.Min(), scores.Max(), 6);
        var top = withPoints.Select(v => v.Ks.Statistic ?? 0).DefaultIfEmpty(0.5).Max();
        var series = withPoints.Select(v => new LineSeries(v.Label, v.Ks.Points.Select(p => new ChartPoint(p.Score, p.Separation)).ToList(), v.Colour, Dashed: v.Role == "shadow")).ToList();
        var chart = new LineChart("ks", "KS: cumulative share of bads minus share of goods at or below each score",
            new ChartAxis("Score", min, max, Plain, 6),
            new ChartAxis("Bads share minus goods share", 0, Math.Min(1, Math.Ceiling(top * 10 + 0.5) / 10), Share),
            series);
        var table = new FigureTable("KS statistic and the score where it peaks", "Version", "KS", "At score");
        foreach (var v in data.Versions)
        {
            table.Row(v.Label, Figures.Number(v.Ks.Statistic), v.Ks.Score is { } s ? Figures.Score(s) : Figures.None);
        }

        return new ChartSection("ks", "Separation: KS curves", PerformancePopulation(data), chart.Render(), table);
    }

    public static IEnumerable<ChartSection> Distributions(OverviewData data)
    {
        foreach (var v in data.Versions)
        {
            var performance = data.Performance.Versions.FirstOrDefault(p => p.Version == v.Number);
            if (performance is null || !data.BaselineShares.TryGetValue(v.Number, out var development))
            {
                continue;
            }

            var live = performance.ScoreDistribution;
            var labels = Figures.BinLabels(live.Select(b => b.UpTo).ToList());
            var top = live.Select(b => b.Share ?? 0).Concat(development).DefaultIfEmpty(0.1).Max();
            var chart = new BarChart($"distribution-v{v.Number}", $"Score distribution of {v.Label} against its development sample",
                "Score bin (upper edge, inclusive)", labels, new ChartAxis("Share of applications", 0, Math.Ceiling(top * 20 + 0.5) / 20, Share),
                [new BarSeries("development", development.Select(d => (double?)d).ToList(), ChartPalette.Baseline),
                 new BarSeries("live", live.Select(b => b.Share).ToList(), v.Colour)]);
            var table = new FigureTable($"Score distribution of {v.Label}", "Score bin", "Development share", "Live share", "Live applications");
            for (var i = 0; i < live.Count; i++)
            {
                table.Row(labels[i], Figures.Percent(i < development.Count ? development[i] : null), Figures.Percent(live[i].Share), Figures.Count(live[i].Count));
            }

            yield return new ChartSection($"distribution-v{v.Number}", $"Score distribution: {v.Label}",
                $"Every application {v.Label} scored, deciding or not; bins are the development baseline's; {data.Performance.Range}.", chart.Render(), table);
        }
    }

    public static ChartSection Psi(OverviewData data)
    {
        var months = data.Stability.Values.SelectMany(s => s.Periods.Select(p => p.Period)).Distinct().Order(StringComparer.Ordinal).ToList();
        var withStability = data.Versions.Where(v => data.Stability.TryGetValue(v.Number, out var s) && s.Available).ToList();
        var thresholds = data.Stability.Values.FirstOrDefault()?.Thresholds ?? new StabilityThresholdsFigure(0.10, 0.25, 0.10, 0.25);
        var series = withStability.Select(v => new BarSeries(v.Label,
            months.Select(m => data.Stability[v.Number].Periods.FirstOrDefault(p => p.Period == m)?.Psi).ToList(), v.Colour)).ToList();
        var top = Math.Max(thresholds.PsiRed * 1.3, series.SelectMany(s => s.Values).Select(p => p ?? 0).DefaultIfEmpty(0).Max() * 1.1);
        var chart = new BarChart("psi", "Population stability index of the score per month, with the 0.10 and 0.25 bands",
            "Month of application", months, new ChartAxis("PSI against development", 0, Math.Ceiling(top * 20) / 20, v => Figures.Number(v, 2)), series)
        {
            Bands = Bands(thresholds.PsiAmber, thresholds.PsiRed, top),
            LabelEvery = months.Count > 12 ? 3 : 1,
        };
        var headers = new List<string> { "Month" };
        headers.AddRange(withStability.Select(v => $"PSI {v.Label}"));
        headers.Add("Applications");
        var table = new FigureTable($"PSI per month (below {Figures.Number(thresholds.PsiAmber, 2)} no significant shift; {Figures.Number(thresholds.PsiAmber, 2)}–{Figures.Number(thresholds.PsiRed, 2)} investigate; above {Figures.Number(thresholds.PsiRed, 2)} act)", [.. headers]);
        // Newest first: the month a reader came for is the latest one.
        foreach (var month in Enumerable.Reverse(months))
        {
            var cells = new List<string> { month };
            cells.AddRange(withStability.Select(v => data.Stability[v.Number].Periods.FirstOrDefault(p => p.Period == month) is { } p
                ? $"{Figures.Number(p.Psi)} {StatusWord(p.Status?.ToString())}" : Figures.None));
            cells.Add(withStability.Count > 0 && data.Stability[withStability[0].Number].Periods.FirstOrDefault(p => p.Period == month) is { } first ? Figures.Count(first.N) : Figures.None);
            table.Row([.. cells]);
        }

        // One sentence for every version shown: each is measured against its own development sample.
        var shown = string.Join(", ", withStability.Select(v => v.Label));
        var population = withStability.Count == 0 ? "No version in the plan has a development baseline to compare with."
            : $"Every application scored by {shown} (deciding or not, any decision, matured or not), each version against its own development sample; {data.Performance.Range}.";
        return new ChartSection("psi", "Stability: PSI per month", population, chart.Render(), table);
    }

    public static ChartSection? Csi(OverviewData data)
    {
        var latest = data.Stability.Values.SelectMany(s => s.Periods).Select(p => p.Period).DefaultIfEmpty().Max(StringComparer.Ordinal);
        if (latest is null)
        {
            return null;
        }

        var withStability = data.Versions.Where(v => data.Stability.TryGetValue(v.Number, out var s) && s.Available).ToList();
        var names = withStability.SelectMany(v => data.Stability[v.Number].Periods.Where(p => p.Period == latest).SelectMany(p => p.Characteristics.Select(c => c.Name)))
            .Distinct().ToList();
        var thresholds = data.Stability.Values.First().Thresholds;
        double? Csi(int version, string name) =>
            data.Stability[version].Periods.FirstOrDefault(p => p.Period == latest)?.Characteristics.FirstOrDefault(c => c.Name == name)?.Csi;
        var series = withStability.Select(v => new BarSeries(v.Label, names.Select(n => Csi(v.Number, n)).ToList(), v.Colour)).ToList();
        var top = Math.Max(thresholds.CsiRed * 1.3, series.SelectMany(s => s.Values).Select(p => p ?? 0).DefaultIfEmpty(0).Max() * 1.1);
        var chart = new BarChart("csi", $"Characteristic stability index per characteristic in {latest}",
            "Characteristic", names, new ChartAxis("CSI against development", 0, Math.Ceiling(top * 20) / 20, v => Figures.Number(v, 2)), series)
        {
            Bands = Bands(thresholds.CsiAmber, thresholds.CsiRed, top),
            Area = PlotArea.Standard with { Height = 400, Bottom = 112 },
        };
        var headers = new List<string> { "Characteristic" };
        headers.AddRange(withStability.Select(v => $"CSI {v.Label}"));
        var table = new FigureTable($"CSI per characteristic, {latest} (— where the version does not use it)", [.. headers]);
        foreach (var name in names)
        {
            var cells = new List<string> { name };
            cells.AddRange(withStability.Select(v => Figures.Number(Csi(v.Number, name))));
            table.Row([.. cells]);
        }

        return new ChartSection("csi", $"Stability: characteristics in {latest}", "Which inputs moved: the share of each characteristic's bins against development.", chart.Render(), table);
    }

    /// <summary>
    /// Cumulative share of bads caught against the share of applications, lowest scores first (a
    /// gains chart, common practice): the further above the diagonal, the more bads a cut-off removes per application lost.
    /// </summary>
    public static IEnumerable<ChartSection> Capture(OverviewData data)
    {
        foreach (var v in data.Versions.Where(v => v.Role != "shadow"))
        {
            var performance = data.Performance.Versions.FirstOrDefault(p => p.Version == v.Number);
            if (performance is null || performance.CaptureAndLift.Count == 0)
            {
                continue;
            }

            var rows = performance.CaptureAndLift;
            List<ChartPoint> points = [new(0, 0), .. rows.Select(r => new ChartPoint(r.PopulationShare, r.CaptureRate))];
            var chart = new LineChart($"capture-v{v.Number}", $"Share of bads among the lowest-scoring applications, {v.Label}",
                new ChartAxis("Share of applications, lowest scores first", 0, 1, Share),
                new ChartAxis("Share of all bads captured", 0, 1, Share),
                [new LineSeries(v.Label, points, v.Colour)])
            { Diagonal = true, Area = ShareArea };
            var table = new FigureTable($"Capture and lift of {v.Label} by score group (tenths of the matured applications, lowest scores first)",
                "Group", "Up to score", "Applications", "Bads", "Bad rate", "Bads captured", "Lift");
            foreach (var r in rows)
            {
                table.Row(r.Group.ToString(System.Globalization.CultureInfo.InvariantCulture), Figures.Score(r.UpperScore), Figures.Number(r.Decisions, 0), Figures.Number(r.Bads, 0),
                    Figures.Percent(r.GroupBadRate, 2), Figures.Percent(r.CaptureRate), Figures.Number(r.Lift, 2));
            }

            yield return new ChartSection($"capture-v{v.Number}", $"Capture and lift: {v.Label}", performance.Population, chart.Render(), table);
        }
    }

    public static IEnumerable<ChartSection> Calibration(OverviewData data)
    {
        foreach (var v in data.Versions.Where(v => v.Role != "shadow"))
        {
            var performance = data.Performance.Versions.FirstOrDefault(p => p.Version == v.Number);
            if (performance is null || performance.Calibration.Count == 0)
            {
                continue;
            }

            var rows = performance.Calibration;
            var labels = Figures.BinLabels(rows.Select(r => r.UpTo).ToList());
            var top = rows.Select(r => Math.Max(r.ExpectedProbabilityOfBad ?? 0, r.ObservedBadRate ?? 0)).DefaultIfEmpty(0.1).Max();
            var chart = new BarChart($"calibration-v{v.Number}", $"Expected probability of bad against observed bad rate per score bin, {v.Label}",
                "Score bin (upper edge, inclusive)", labels, new ChartAxis("Probability of bad", 0, Math.Max(0.02, Math.Ceiling(top * 50 + 0.5) / 50), v => Figures.Percent(v, 0)),
                [new BarSeries("expected (scaling)", rows.Select(r => r.ExpectedProbabilityOfBad).ToList(), ChartPalette.Baseline),
                 new BarSeries("observed", rows.Select(r => r.ObservedBadRate).ToList(), v.Colour)]);
            var table = new FigureTable($"Calibration of {v.Label}; Hosmer–Lemeshow p = {Figures.Number(performance.HosmerLemeshow.PValue)}, Brier score {Figures.Number(performance.BrierScore, 4)}",
                "Score bin", "Matured", "Bads", "Expected", "Observed", "Jeffreys p", "Status");
            for (var i = 0; i < rows.Count; i++)
            {
                var r = rows[i];
                table.Row(labels[i], Figures.Count(r.Matured), Figures.Count(r.Bads), Figures.Percent(r.ExpectedProbabilityOfBad, 2),
                    Figures.Percent(r.ObservedBadRate, 2), Figures.Number(r.JeffreysP), StatusWord(r.Status.ToString()));
            }

            yield return new ChartSection($"calibration-v{v.Number}", $"Calibration: {v.Label}", performance.Population, chart.Render(), table);
        }
    }

    public static IEnumerable<ChartSection> SwapSets(OverviewData data)
    {
        Band[] bands = [Band.Approve, Band.Refer, Band.Decline];
        string[] colours = [ChartPalette.Good, ChartPalette.Refer, ChartPalette.Bad];
        foreach (var challenger in data.Comparison.Challengers)
        {
            var cells = challenger.SwapSet;
            var series = bands.Select((b, i) => new BarSeries($"v{challenger.Version} {BandNames.ToWire(b)}s",
                bands.Select(c => (double?)cells.Where(x => x.Champion == c && x.Challenger == b).Sum(x => x.Count)).ToList(), colours[i])).ToList();
            var top = bands.Select(c => cells.Where(x => x.Champion == c).Sum(x => x.Count)).DefaultIfEmpty(1).Max();
            var (_, max) = Charts.LinearScale.NiceDomain(0, Math.Max(1, top), 5);
            var champion = data.Comparison.Champion?.Version;
            var chart = new BarChart($"swap-v{challenger.Version}", $"Swap set: champion v{champion}'s decision, split by challenger v{challenger.Version}'s",
                $"Champion v{champion}'s decision", bands.Select(BandNames.ToWire).ToList(), new ChartAxis("Applications", 0, max, v => Figures.Count((long)v)), series)
            { Stacked = true };
            var table = new FigureTable($"Swap set, champion v{champion} against challenger v{challenger.Version}", "Champion", "Challenger", "Applications", "Matured", "Bads", "Bad rate");
            foreach (var cell in cells)
            {
                table.Row(BandNames.ToWire(cell.Champion), BandNames.ToWire(cell.Challenger), Figures.Count(cell.Count), Figures.Count(cell.Matured), Figures.Count(cell.Bads), Figures.Percent(cell.BadRate, 2));
            }

            var observed = string.Join(" ", cells.Select(c => c.Observed).Distinct(StringComparer.Ordinal));
            yield return new ChartSection($"swap-v{challenger.Version}", $"Swap set: v{champion} against v{challenger.Version}",
                $"Applications scored by both; bad rates where the outcome has matured ({observed}).", chart.Render(), table);
        }
    }

    public static ChartSection Maturity(OverviewData data)
    {
        var cohorts = data.Cohorts;
        (string Name, string Colour, Func<CohortMaturity, long> Count)[] parts =
        [
            ("matured good", ChartPalette.Good, c => c.MaturedGood),
            ("matured bad", ChartPalette.Bad, c => c.MaturedBad),
            ("indeterminate", ChartPalette.Shadow, c => c.MaturedIndeterminate),
            ("immature", ChartPalette.Pending, c => c.Immature),
            ("not approved", ChartPalette.NotApproved, c => c.NotApproved),
        ];
        var series = parts.Select(p => new BarSeries(p.Name, cohorts.Select(c => (double?)p.Count(c)).ToList(), p.Colour)).ToList();
        var (_, max) = Charts.LinearScale.NiceDomain(0, Math.Max(1, cohorts.Select(c => c.Total).DefaultIfEmpty(1).Max()), 5);
        var chart = new BarChart("maturity", $"Applications per month by outcome status ({data.PerformanceWindowMonths}-month performance window)",
            "Month of application", cohorts.Select(c => c.Month).ToList(), new ChartAxis("Applications", 0, max, v => Figures.Count((long)v)), series)
        {
            Stacked = true,
            LabelEvery = cohorts.Count > 12 ? 3 : 1,
        };
        var table = new FigureTable("Cohorts by month of application", "Month", "Applications", "Not approved", "Matured good", "Matured bad", "Indeterminate", "Immature");
        foreach (var c in cohorts.Reverse())
        {
            table.Row(c.Month, Figures.Count(c.Total), Figures.Count(c.NotApproved), Figures.Count(c.MaturedGood), Figures.Count(c.MaturedBad),
                Figures.Count(c.MaturedIndeterminate), Figures.Count(c.Immature));
        }

        return new ChartSection("maturity", "Maturity of cohorts",
            $"Decisions by the version that decided them; an approved loan matures when it goes bad or when its {data.PerformanceWindowMonths}-month window has passed at an observation. Only matured loans enter performance figures.",
            chart.Render(), table);
    }

    private static IReadOnlyList<ChartBand> Bands(double amber, double red, double top) =>
    [
        new(0, amber, ChartPalette.GreenBand, $"below {Figures.Number(amber, 2)}: no significant shift"),
        new(amber, red, ChartPalette.AmberBand, $"{Figures.Number(amber, 2)} to {Figures.Number(red, 2)}: investigate"),
        new(red, Math.Max(top, red) * 2, ChartPalette.RedBand, $"above {Figures.Number(red, 2)}: act"),
    ];

    private static string StatusWord(string? status) => status?.ToLowerInvariant() ?? "";

    private static string PerformancePopulation(OverviewData data) =>
        $"Approved applications with matured good or bad outcomes, each version judged on the same applications; {data.Performance.Range}.";
}

/// <summary>One chart panel: its SVG and the table of its numbers, with a line saying on which population it stands.</summary>
public sealed record ChartSection(string Id, string Heading, string Population, string Svg, FigureTable Table);
