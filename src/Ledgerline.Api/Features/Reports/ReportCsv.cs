using System.Globalization;
using System.Text;
using System.Text.Json;

namespace Ledgerline.Api.Features.Reports;

/// <summary>The tabular parts of the reports as CSV (RFC 4180), for analysts' spreadsheets.</summary>
public static class ReportCsv
{
    public const string MediaType = "text/csv";

    /// <summary>
    /// Every table of the performance report in one file: the summary first (so a reader that takes
    /// the first table gets what it always got), then each further table after a blank line, under a
    /// row holding only the table's name, with its own header row.
    /// </summary>
    public static string Performance(PerformanceReport report)
    {
        var csv = new StringBuilder();
        Row(csv, "version", "decisions", "approved", "matured", "bads", "badRate", "auc", "aucLower", "aucUpper", "gini", "ks", "ksScore",
            "brierScore", "hosmerLemeshow", "hosmerLemeshowDf", "hosmerLemeshowP", "developmentAuc", "aucDeclineP", "population");
        foreach (var v in report.Versions)
        {
            Row(csv, v.Version, v.Decisions, v.Approved, v.Matured, v.Bads, v.BadRate, v.Auc, v.AucConfidenceInterval?.Lower, v.AucConfidenceInterval?.Upper,
                v.Gini, v.Ks, v.KsScore, v.BrierScore, v.HosmerLemeshow.Statistic, v.HosmerLemeshow.DegreesOfFreedom, v.HosmerLemeshow.PValue,
                v.Development?.Auc, v.Development?.AucDeclineTest?.PValue, v.Population);
        }

        Section(csv, "scoreDistribution", "version", "upTo", "count", "share");
        foreach (var v in report.Versions)
        {
            foreach (var bin in v.ScoreDistribution)
            {
                Row(csv, v.Version, bin.UpTo, bin.Count, bin.Share);
            }
        }

        Section(csv, "captureAndLift", "version", "group", "populationShare", "upperScore", "decisions", "bads", "groupBadRate", "captureRate", "lift");
        foreach (var v in report.Versions)
        {
            foreach (var g in v.CaptureAndLift)
            {
                Row(csv, v.Version, g.Group, g.PopulationShare, g.UpperScore, g.Decisions, g.Bads, g.GroupBadRate, g.CaptureRate, g.Lift);
            }
        }

        Section(csv, "calibration", "version", "upTo", "matured", "bads", "expectedProbabilityOfBad", "observedBadRate", "jeffreysP", "binomialP", "status");
        foreach (var v in report.Versions)
        {
            foreach (var bin in v.Calibration)
            {
                Row(csv, v.Version, bin.UpTo, bin.Matured, bin.Bads, bin.ExpectedProbabilityOfBad, bin.ObservedBadRate, bin.JeffreysP, bin.BinomialP,
                    JsonNamingPolicy.CamelCase.ConvertName(bin.Status.ToString()));
            }
        }

        Section(csv, "rankOrdering", "version", "monotone", "reversals", "rule");
        foreach (var v in report.Versions)
        {
            Row(csv, v.Version, v.RankOrdering.Monotone, string.Join(' ', v.RankOrdering.Reversals.Select(r => r?.ToString(CultureInfo.InvariantCulture) ?? "last")),
                v.RankOrdering.Rule);
        }

        return csv.ToString();
    }

    private static void Section(StringBuilder csv, string table, params object?[] header)
    {
        csv.Append("\r\n");
        Row(csv, table);
        Row(csv, header);
    }

    public static string Comparison(ComparisonReport report)
    {
        var csv = new StringBuilder();
        Row(csv, "version", "role", "auc", "aucDifference", "pairedN", "pairedZ", "pairedP", "unpairedZ", "unpairedP", "approvalRate", "armBadRate",
            "approvalRateDifferenceP", "badRateDifferenceP", "verdict");
        if (report.Champion is { } champion)
        {
            Row(csv, champion.Version, "champion", champion.Auc, null, null, null, null, null, null, champion.Arm.ApprovalRate, champion.Arm.BadRate, null, null, null);
        }

        foreach (var c in report.Challengers)
        {
            Row(csv, c.Version, "challenger", c.Auc, c.AucDifference, c.PairedTest.N, c.PairedTest.Z, c.PairedTest.PValue, c.UnpairedTest.Z, c.UnpairedTest.PValue,
                c.Figures.Arm.ApprovalRate, c.Figures.Arm.BadRate, c.ApprovalRateDifference.PValue, c.BadRateDifference.PValue, c.Verdict);
        }

        return csv.ToString();
    }

    public static string Stability(StabilityReport report)
    {
        var csv = new StringBuilder();
        Row(csv, "version", "period", "n", "subject", "index", "status", "missingShare", "developmentMissingShare");
        foreach (var p in report.Periods)
        {
            Row(csv, report.Version, p.Period, p.N, "score", p.Psi, Word(p.Status), null, null);
            foreach (var c in p.Characteristics)
            {
                Row(csv, report.Version, p.Period, p.N, c.Name, c.Csi, Word(c.Status), c.MissingShare, c.DevelopmentMissingShare);
            }
        }

        return csv.ToString();
    }

    private static string? Word(Scoring.Monitoring.StabilityStatus? status) => status?.ToString().ToLowerInvariant();

    private static void Row(StringBuilder csv, params object?[] cells)
    {
        for (var i = 0; i < cells.Length; i++)
        {
            if (i > 0)
            {
                csv.Append(',');
            }

            var text = cells[i] switch
            {
                null => "",
                bool b => b ? "true" : "false",
                double d => d.ToString("R", CultureInfo.InvariantCulture),
                IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
                var other => other.ToString() ?? "",
            };
            csv.Append(text.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : text);
        }

        csv.Append("\r\n");
    }
}
