using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;

namespace Ledgerline.Api.Features.Overview;

/// <summary>
/// Writes the overview as one self-contained HTML document: inline styles, inline SVG, no
/// script, no font or image from anywhere else, so it opens on a closed network and prints.
/// </summary>
public static class OverviewPage
{
    public static string Render(OverviewData data)
    {
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\">")
            .Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">")
            .Append("<title>").Append(E($"{data.Name}: overview")).Append("</title><style>").Append(Style).Append("</style></head><body>");
        Header(html, data);
        html.Append("<main>");
        Verdict(html, data);
        Alerts(html, data);
        Summary(html, data);

        List<ChartSection> sections = [OverviewCharts.Roc(data), OverviewCharts.Ks(data)];
        sections.AddRange(OverviewCharts.SwapSets(data));
        sections.AddRange(OverviewCharts.Calibration(data));
        sections.Add(OverviewCharts.Psi(data));
        if (OverviewCharts.Csi(data) is { } csi)
        {
            sections.Add(csi);
        }

        sections.AddRange(OverviewCharts.Distributions(data));
        sections.Add(OverviewCharts.Maturity(data));
        foreach (var section in sections)
        {
            html.Append("<section class=\"panel\" id=\"").Append(E(section.Id)).Append("\"><h2>").Append(E(section.Heading)).Append("</h2>")
                .Append("<p class=\"population\">").Append(E(section.Population)).Append("</p>")
                .Append("<div class=\"pair\"><figure>").Append(section.Svg).Append("</figure><div class=\"numbers\">").Append(section.Table).Append("</div></div></section>");
        }

        html.Append("</main><footer>Figures from the performance, comparison and stability reports of this service (JSON and CSV at ")
            .Append(E($"/scorecards/{data.Key}/reports/…")).Append("). Higher scores mean lower risk. ")
            .Append(E($"Page made {data.AsOf:yyyy-MM-dd}.")).Append("</footer></body></html>");
        return html.ToString();
    }

    private static void Header(StringBuilder html, OverviewData data)
    {
        html.Append("<header><div class=\"brand\">Ledgerline</div><h1>").Append(E(data.Name)).Append("</h1><p class=\"meta\">")
            .Append(E($"Scorecard {data.Key} · {data.Performance.Range} · as of {data.AsOf:yyyy-MM-dd} · {data.PerformanceWindowMonths}-month performance window"))
            .Append("</p><ul class=\"plan\">");
        foreach (var v in data.Versions)
        {
            var share = v.Share is { } s ? $" · {Figures.Percent(s, 0)} of applications" : v.Role == "shadow" ? " · scores every application, decides none" : "";
            html.Append("<li><span class=\"swatch\" style=\"background:").Append(v.Colour).Append("\"></span>").Append(E(v.Label + share)).Append("</li>");
        }

        html.Append("</ul></header>");
    }

    private static void Verdict(StringBuilder html, OverviewData data)
    {
        html.Append("<section class=\"verdict\"><h2>Verdict</h2>");
        if (data.Comparison.Challengers.Count == 0)
        {
            html.Append("<p>").Append(E(data.Comparison.Reason ?? "No challenger to compare.")).Append("</p>");
        }

        foreach (var c in data.Comparison.Challengers)
        {
            var champion = data.Comparison.Champion;
            html.Append("<div class=\"call\"><p class=\"headline\">").Append(E($"Challenger v{c.Version} against champion v{champion?.Version}: {c.Verdict}")).Append("</p>")
                .Append("<p>").Append(E($"AUC {Figures.Number(c.Auc)} against {Figures.Number(champion?.Auc)} (difference {Figures.Number(c.AucDifference)}); paired DeLong test on {Figures.Count(c.PairedTest.N)} applications scored by both: z = {Figures.Number(c.PairedTest.Z, 2)}, p = {Figures.Number(c.PairedTest.PValue, 4)}."))
                .Append("</p><p>").Append(E($"Approval rate {Figures.Percent(c.ApprovalRateDifference.Challenger)} against {Figures.Percent(c.ApprovalRateDifference.Champion)}; bad rate of approved, matured loans {Figures.Percent(c.BadRateDifference.Challenger, 2)} against {Figures.Percent(c.BadRateDifference.Champion, 2)}."))
                .Append("</p><p class=\"rule\">").Append(E("Rule: " + c.VerdictRule)).Append("</p></div>");
        }

        html.Append("</section>");
    }

    private static void Alerts(StringBuilder html, OverviewData data)
    {
        html.Append("<section class=\"alerts\"><h2>Open alerts</h2>");
        if (data.Alerts.Count == 0)
        {
            html.Append("<p>None open.</p></section>");
            return;
        }

        html.Append("<ul>");
        foreach (var a in data.Alerts)
        {
            html.Append("<li class=\"").Append(E(a.Severity.ToLowerInvariant())).Append("\"><span class=\"badge\">").Append(E(a.Severity)).Append("</span> <strong>")
                .Append(E($"{a.Kind} · v{a.Version} · {a.Subject} · {a.Period}")).Append("</strong> ")
                .Append(E($"{Figures.Number(a.Figure)} against threshold {Figures.Number(a.Threshold)}. {a.Evidence}")).Append("</li>");
        }

        html.Append("</ul></section>");
    }

    private static void Summary(StringBuilder html, OverviewData data)
    {
        var table = new HtmlTable("Each version over the range", "Version", "Applications scored", "Would approve", "Matured", "Bad rate", "AUC", "KS", "Latest PSI");
        foreach (var v in data.Versions)
        {
            var p = data.Performance.Versions.FirstOrDefault(x => x.Version == v.Number);
            var latest = data.Stability.TryGetValue(v.Number, out var s) ? s.Periods.Count > 0 ? s.Periods[^1] : null : null;
            table.Row(v.Label, p is null ? Figures.None : Figures.Count(p.Decisions), Figures.Percent(p?.OwnBands.Approve), p is null ? Figures.None : Figures.Count(p.Matured),
                Figures.Percent(p?.BadRate, 2), Figures.Number(p?.Auc), Figures.Number(p?.Ks),
                latest is null ? Figures.None : string.Create(CultureInfo.InvariantCulture, $"{Figures.Number(latest.Psi)} ({latest.Period})"));
        }

        html.Append("<section class=\"summary\"><h2>At a glance</h2>").Append(table).Append("</section>");
    }

    private static string E(string text) => HtmlEncoder.Default.Encode(text);

    private const string Style = """
        :root{--ink:#1d2433;--muted:#5d6677;--paper:#f6f4ef;--card:#fffdf8;--line:#ddd8cc;--accent:#22577a;--amber:#b45309;--red:#b42318}
        *{box-sizing:border-box}
        body{margin:0;background:var(--paper);color:var(--ink);font:15px/1.45 "Segoe UI",system-ui,-apple-system,"Helvetica Neue",Arial,sans-serif}
        header{background:var(--ink);color:#f6f4ef;padding:22px 32px 18px}
        .brand{font-size:12px;letter-spacing:.22em;text-transform:uppercase;color:#9fc3d9}
        h1{margin:4px 0 2px;font-size:26px;font-weight:600}
        .meta{margin:0 0 10px;color:#c9cfdb;font-size:13px}
        .plan{list-style:none;margin:0;padding:0;display:flex;flex-wrap:wrap;gap:8px 22px;font-size:14px}
        .swatch{display:inline-block;width:14px;height:14px;border-radius:3px;margin-right:6px;vertical-align:-2px;border:1px solid #fff6}
        main{max-width:1320px;margin:0 auto;padding:20px 32px 40px;display:grid;gap:18px}
        h2{font-size:17px;margin:0 0 6px;font-weight:600}
        .panel,.verdict,.alerts,.summary{background:var(--card);border:1px solid var(--line);border-radius:10px;padding:16px 20px}
        .verdict{border-left:6px solid var(--accent)}
        .verdict .headline{font-size:18px;font-weight:600;margin:4px 0}
        .verdict p{margin:4px 0}
        .rule,.population{color:var(--muted);font-size:13px;margin:0 0 10px}
        .alerts ul{list-style:none;padding:0;margin:0;display:grid;gap:6px}
        .alerts li{padding:8px 10px;border-radius:6px;background:#fbe7c2}
        .alerts li.red{background:#f7d0c8}
        .badge{display:inline-block;font-size:11px;font-weight:700;text-transform:uppercase;letter-spacing:.08em;padding:1px 7px;border-radius:4px;background:var(--amber);color:#fff}
        .alerts li.red .badge{background:var(--red)}
        .pair{display:grid;grid-template-columns:minmax(0,1.25fr) minmax(0,1fr);gap:20px;align-items:start}
        figure{margin:0}
        svg{width:100%;height:auto;display:block}
        .numbers{max-height:360px;overflow:auto}
        table{border-collapse:collapse;width:100%;font-size:13px;font-variant-numeric:tabular-nums}
        caption{text-align:left;font-size:12px;color:var(--muted);padding-bottom:6px}
        th,td{padding:4px 8px;border-bottom:1px solid var(--line);text-align:right;white-space:nowrap}
        th:first-child,thead th:first-child{text-align:left}
        thead th{position:sticky;top:0;background:var(--card);font-weight:600;border-bottom:2px solid var(--ink)}
        tbody th{font-weight:500}
        footer{max-width:1320px;margin:0 auto;padding:0 32px 32px;color:var(--muted);font-size:12px}
        @media (max-width:900px){.pair{grid-template-columns:1fr}}
        @media print{
          body{background:#fff;font-size:11px}
          header{background:#fff;color:var(--ink);border-bottom:2px solid var(--ink);padding:0 0 8px}
          .brand{color:var(--muted)} .meta{color:var(--muted)}
          main{padding:8px 0;max-width:none}
          .panel,.verdict,.alerts,.summary{break-inside:avoid;border-color:#999}
          .numbers{max-height:none;overflow:visible}
          .pair{grid-template-columns:1.2fr 1fr}
        }
        """;
}
