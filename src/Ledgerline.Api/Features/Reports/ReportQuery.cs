using System.Globalization;
using Ledgerline.Api.Http;
using Ledgerline.Scoring.Scorecards;
using Microsoft.AspNetCore.Http.HttpResults;

namespace Ledgerline.Api.Features.Reports;

/// <summary>The query parameters every report shares, parsed here so each problem names its parameter.</summary>
public sealed record ReportQuery(int? Version, DateOnly? From, DateOnly? To, ReportPeriod Period)
{
    /// <summary>Parses and checks the parameters; the problem names the parameter and what was expected.</summary>
    public static (ReportQuery? Query, ValidationProblem? Problem) Parse(string? version, string? from, string? to, string? period)
    {
        var problems = new List<FieldProblem>();
        int? number = null;
        if (version is not null)
        {
            if (int.TryParse(version, NumberStyles.None, CultureInfo.InvariantCulture, out var parsed) && parsed > 0)
            {
                number = parsed;
            }
            else
            {
                problems.Add(new("version", $"'{version}' is not a version number; give a whole number such as 2"));
            }
        }

        var fromDate = ParseDate("from", from, problems);
        var toDate = ParseDate("to", to, problems);
        if (fromDate is { } f && toDate is { } t && f > t)
        {
            problems.Add(new("from", $"'from' ({f:yyyy-MM-dd}) is after 'to' ({t:yyyy-MM-dd}); give a range whose start is on or before its end"));
        }

        var reportPeriod = ReportPeriod.Month;
        switch (period)
        {
            case null or "month": break;
            case "week": reportPeriod = ReportPeriod.Week; break;
            default: problems.Add(new("period", $"'{period}' is not a period; use 'week' or 'month'")); break;
        }

        return problems.Count > 0 ? (null, Problems.Invalid(problems)) : (new ReportQuery(number, fromDate, toDate, reportPeriod), null);
    }

    /// <summary>Words for the range, as every population statement gives it.</summary>
    public string RangeText =>
        (From, To) switch
        {
            (null, null) => "all application dates",
            ({ } f, null) => $"application dates from {f:yyyy-MM-dd}",
            (null, { } t) => $"application dates up to {t:yyyy-MM-dd}",
            ({ } f, { } t) => $"application dates {f:yyyy-MM-dd} to {t:yyyy-MM-dd}",
        };

    private static DateOnly? ParseDate(string name, string? text, List<FieldProblem> problems)
    {
        if (text is null)
        {
            return null;
        }

        if (DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date))
        {
            return date;
        }

        problems.Add(new(name, $"'{text}' is not a date; give it as yyyy-MM-dd, e.g. 2026-01-31"));
        return null;
    }
}

/// <summary>Stability periods.</summary>
public enum ReportPeriod
{
    Month,
    Week,
}
