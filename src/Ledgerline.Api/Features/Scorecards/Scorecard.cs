namespace Ledgerline.Api.Features.Scorecards;

/// <summary>A scorecard family: a stable key and the outcome definition all its versions share.</summary>
public sealed class Scorecard
{
    public long Id { get; set; }

    public required string Key { get; set; }

    public required string Name { get; set; }

    /// <summary>Worst days past due at or beyond which an account is bad (e.g. 90).</summary>
    public int BadDaysPastDue { get; set; }

    /// <summary>Worst days past due from which an account is indeterminate, below the bad threshold (e.g. 30).</summary>
    public int IndeterminateDaysPastDue { get; set; }

    /// <summary>Calendar months after the application date in which performance is observed.</summary>
    public int PerformanceWindowMonths { get; set; }

    public DateTimeOffset CreatedAt { get; set; }

    public required string CreatedBy { get; set; }

    public List<ScorecardVersion> Versions { get; } = [];
}
