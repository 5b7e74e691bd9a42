namespace Ledgerline.Api.Features.Overview;

/// <summary>The page's only style sheet, inline (the CSP admits nothing from elsewhere); print rules make it an A4 monitoring pack.</summary>
public static class OverviewStyle
{
    public const string Css = """
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
        .alerts details{margin-top:8px} .alerts summary{cursor:pointer;color:var(--accent)} .alerts details ul{margin-top:6px}
        .alerts li{padding:8px 10px;border-radius:6px;background:#fbe7c2}
        .alerts li.red{background:#f7d0c8}
        .badge{display:inline-block;font-size:11px;font-weight:700;text-transform:uppercase;letter-spacing:.08em;padding:1px 7px;border-radius:4px;background:var(--amber);color:#fff}
        .alerts li.red .badge{background:var(--red)}
        .pair{display:grid;grid-template-columns:repeat(auto-fit,minmax(min(100%,520px),1fr));gap:20px;align-items:start}
        .pair.wide{grid-template-columns:1fr} .pair.wide figure{max-width:680px}
        figure{margin:0}
        svg{width:100%;height:auto;display:block}
        .numbers{overflow-x:auto}
        table{border-collapse:collapse;width:100%;font-size:13px;font-variant-numeric:tabular-nums}
        caption{text-align:left;font-size:12px;color:var(--muted);padding-bottom:6px}
        th,td{padding:4px 8px;border-bottom:1px solid var(--line);text-align:right;white-space:nowrap}
        th:first-child,thead th:first-child{text-align:left}
        thead th{background:var(--card);font-weight:600;border-bottom:2px solid var(--ink);white-space:normal;vertical-align:bottom}
        tbody th{font-weight:500}
        footer{max-width:1320px;margin:0 auto;padding:0 32px 32px;color:var(--muted);font-size:12px}
        @page{size:A4;margin:12mm}
        @media print{
          body{background:#fff;font-size:11px}
          header{background:#fff;color:var(--ink);border-bottom:2px solid var(--ink);padding:0 0 8px}
          .brand{color:var(--muted)} .meta{color:var(--muted)}
          main{padding:8px 0;max-width:none}
          .panel,.verdict,.alerts,.summary{border-color:#999}
          figure,.verdict,.alerts,.summary,tr{break-inside:avoid}
          h2,figcaption{break-after:avoid}
          .numbers{max-height:none;overflow:visible}
          .pair{grid-template-columns:1fr}
          details{display:block} details>*{display:block}
        }
        """;
}
