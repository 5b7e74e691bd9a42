using System.Globalization;
using Ledgerline.Scoring.Outcomes;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>Field names and the reading of field values given as text (CSV cells, JSON strings).</summary>
internal static class OutcomeFieldText
{
    public const string ApplicationId = "applicationId";
    public const string ObservedAt = "observedAt";
    public const string WorstDaysPastDue = "worstDaysPastDue";
    public const string ChargedOff = "chargedOff";
    public const string Status = "status";

    public const string FieldList = "applicationId, observedAt, worstDaysPastDue, chargedOff, status";

    public static void SetObservedAt(OutcomeRow row, string text)
    {
        if (DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date))
        {
            row.ObservedAt = date;
        }
        else
        {
            row.Fail($"observedAt '{Shorten(text)}' is not a date; expected yyyy-MM-dd, e.g. 2027-12-01.");
        }
    }

    public static void SetWorstDaysPastDue(OutcomeRow row, string text)
    {
        if (int.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var days))
        {
            row.WorstDaysPastDue = days;
        }
        else
        {
            row.Fail($"worstDaysPastDue '{Shorten(text)}' is not a whole number of days; expected 0 or more, e.g. 95.");
        }
    }

    public static void SetChargedOff(OutcomeRow row, string text)
    {
        switch (text)
        {
            case "true":
                row.ChargedOff = true;
                break;
            case "false":
                row.ChargedOff = false;
                break;
            default:
                row.Fail($"chargedOff '{Shorten(text)}' is not true or false.");
                break;
        }
    }

    public static void SetStatus(OutcomeRow row, string text)
    {
        if (OutcomeReadingCheck.TryParseStatus(text, out var status))
        {
            row.Status = status;
        }
        else
        {
            row.Fail($"status '{Shorten(text)}' is not one of good, bad, indeterminate.");
        }
    }

    /// <summary>Echoes a value back without letting a huge one flood the answer.</summary>
    public static string Shorten(string text) => text.Length <= 40 ? text : text[..40] + "…";
}
