using System.Globalization;

namespace Ledgerline.Api.Features.Overview;

/// <summary>The "at a glance" table: one row per version in plan order.</summary>
public static class OverviewSummary
{
    public static FigureTable Glance(OverviewData data)
    {
        var table = new FigureTable("Each version over the range", "Version", "Applications scored", "Would approve", "Matured", "Bad rate", "AUC", "KS", "Latest PSI");
        foreach (var v in data.Versions)
        {
            var p = data.Performance.Versions.FirstOrDefault(x => x.Version == v.Number);
            var latest = data.Stability.TryGetValue(v.Number, out var s) ? s.Periods.Count > 0 ? s.Periods[^1] : null : null;
            table.Row(v.Label, p is null ? Figures.None : Figures.Count(p.Decisions), Figures.Percent(p?.OwnBands.Approve), p is null ? Figures.None : Figures.Count(p.Matured),
                Figures.Percent(p?.BadRate, 2), Figures.Number(p?.Auc), Figures.Number(p?.Ks),
                latest is null ? Figures.None : string.Create(CultureInfo.InvariantCulture, $"{Figures.Number(latest.Psi)} ({latest.Period})"));
        }

        return table;
    }
}
