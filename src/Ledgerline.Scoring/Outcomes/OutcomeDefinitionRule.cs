namespace Ledgerline.Scoring.Outcomes;

/// <summary>
/// A scorecard's outcome definition and the arithmetic of its performance window.
/// </summary>
/// <remarks>
/// The window runs from the application date to <see cref="WindowEnd"/>, both days included:
/// the window end is the application date plus <see cref="PerformanceWindowMonths"/> calendar
/// months, and it is also the window's last day. A servicing run dated on that day has seen the
/// whole window, so it both counts towards the window and proves the window has elapsed. Month
/// arithmetic follows <see cref="DateOnly.AddMonths(int)"/>: a day that does not exist in the target
/// month becomes that month's last day (31 January + 1 month = 28 or 29 February; 29 February
/// 2028 + 12 months = 28 February 2029).
/// </remarks>
/// <param name="BadDaysPastDue">Worst days past due at or beyond which an account is bad (e.g. 90).</param>
/// <param name="IndeterminateDaysPastDue">Worst days past due from which an account is indeterminate, below the bad threshold (e.g. 30).</param>
/// <param name="PerformanceWindowMonths">Calendar months from the application date in which performance counts (e.g. 12).</param>
public sealed record OutcomeDefinitionRule(int BadDaysPastDue, int IndeterminateDaysPastDue, int PerformanceWindowMonths)
{
    /// <summary>The last day of the performance window of an application taken on <paramref name="applicationDate"/>.</summary>
    /// <param name="applicationDate">The date the window runs from.</param>
    /// <returns>The application date plus the window's calendar months, clamped to the month's last day.</returns>
    public DateOnly WindowEnd(DateOnly applicationDate) => applicationDate.AddMonths(PerformanceWindowMonths);

    /// <summary>
    /// The earliest application date whose window ends on or after <paramref name="date"/>, so
    /// "window ends on or after a date" can be asked of stored application dates in a query.
    /// </summary>
    /// <param name="date">The date the window end must reach.</param>
    /// <returns>The smallest application date <c>a</c> with <c>WindowEnd(a) &gt;= date</c>.</returns>
    public DateOnly EarliestApplicationDateEndingOnOrAfter(DateOnly date)
    {
        // AddMonths clamps month ends, so it is monotone but not invertible: step from an estimate.
        var candidate = date.AddMonths(-PerformanceWindowMonths);
        while (WindowEnd(candidate) < date)
        {
            candidate = candidate.AddDays(1);
        }

        while (candidate > DateOnly.MinValue && WindowEnd(candidate.AddDays(-1)) >= date)
        {
            candidate = candidate.AddDays(-1);
        }

        return candidate;
    }

    /// <summary>The class of worst days past due on their own.</summary>
    /// <param name="worstDaysPastDue">Whole days, not negative.</param>
    /// <returns>Bad at or beyond <see cref="BadDaysPastDue"/>; indeterminate from <see cref="IndeterminateDaysPastDue"/>; otherwise good.</returns>
    public PerformanceClass ClassifyDaysPastDue(int worstDaysPastDue) =>
        worstDaysPastDue >= BadDaysPastDue ? PerformanceClass.Bad
        : worstDaysPastDue >= IndeterminateDaysPastDue ? PerformanceClass.Indeterminate
        : PerformanceClass.Good;

    /// <summary>
    /// The class one reading shows on its own: an explicit status as given; otherwise bad when
    /// charged off; otherwise the class of its worst days past due.
    /// </summary>
    /// <param name="reading">A reading that passed <see cref="OutcomeReadingCheck.Check"/>.</param>
    /// <returns>The reading's class.</returns>
    /// <exception cref="ArgumentException">The reading gives nothing to classify by.</exception>
    public PerformanceClass Classify(OutcomeReading reading)
    {
        if (reading.Status is { } status)
        {
            return status;
        }

        if (reading.ChargedOff == true)
        {
            return PerformanceClass.Bad;
        }

        return reading.WorstDaysPastDue is { } days
            ? ClassifyDaysPastDue(days)
            : throw new ArgumentException("The reading gives neither worst days past due, a charge-off nor a status.", nameof(reading));
    }
}
