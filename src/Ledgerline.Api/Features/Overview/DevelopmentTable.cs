namespace Ledgerline.Api.Features.Overview;

/// <summary>Each version against its development sample, and whether bad rates fall as scores rise.</summary>
public static class DevelopmentTable
{
    public static FigureTable Build(OverviewData data)
    {
        var table = new FigureTable("Live figures against development (AUC decline: one-sided test that live AUC is below development's); rank ordering of bad rates by score bin",
            "Version", "Development AUC", "Live AUC", "Decline", "p (decline)", "Development bad rate", "Live bad rate", "Rank ordering");
        foreach (var v in data.Versions)
        {
            var p = data.Performance.Versions.FirstOrDefault(x => x.Version == v.Number);
            if (p is null)
            {
                continue;
            }

            var d = p.Development;
            var test = d?.AucDeclineTest;
            var ordering = p.RankOrdering.Monotone switch
            {
                true => "holds",
                false => $"reversed at {string.Join(", ", p.RankOrdering.Reversals.Select(Figures.Score))}",
                null => p.RankOrdering.Reason ?? Figures.None,
            };
            table.Row(v.Label, Figures.Number(d?.Auc), Figures.Number(test?.CurrentAuc ?? p.Auc), Figures.Number(test?.Decline), Figures.Number(test?.PValue, 4),
                Figures.Percent(d?.BadRate, 2), Figures.Percent(p.BadRate, 2), ordering);
        }

        return table;
    }
}
