using System.Globalization;
using Ledgerline.Scoring.Outcomes;

namespace Ledgerline.Scoring.Tests.Outcomes;

/// <summary>
/// The outcome definition used throughout: bad from 90 days past due, indeterminate from 30,
/// a 12-month window. 90 days past due as the bad threshold and 30 as the start of the
/// indeterminate band are common practice; the thresholds themselves are the scorecard's.
/// </summary>
public sealed class OutcomeClassifierTests
{
    private static readonly OutcomeDefinitionRule Rule = new(BadDaysPastDue: 90, IndeterminateDaysPastDue: 30, PerformanceWindowMonths: 12);

    // Application 2026-03-15: the window end (its last day) is 2027-03-15.
    public static TheoryData<string, string, string[], PerformanceClass, bool> Cases => new()
    {
        { "29 days past due is good (not yet matured inside the window)", "2026-03-15", ["2026-09-01 dpd=29"], PerformanceClass.Good, false },
        { "30 days past due is indeterminate", "2026-03-15", ["2026-09-01 dpd=30"], PerformanceClass.Indeterminate, false },
        { "89 days past due is indeterminate", "2026-03-15", ["2026-09-01 dpd=89"], PerformanceClass.Indeterminate, false },
        { "90 days past due inside the window is bad and matured at once", "2026-03-15", ["2026-09-01 dpd=90"], PerformanceClass.Bad, true },
        { "29 days past due on the window end is good and matured", "2026-03-15", ["2027-03-15 dpd=29"], PerformanceClass.Good, true },
        { "30 days past due on the window end is indeterminate and matured", "2026-03-15", ["2027-03-15 dpd=30"], PerformanceClass.Indeterminate, true },
        { "89 days past due on the window end is indeterminate and matured", "2026-03-15", ["2027-03-15 dpd=89"], PerformanceClass.Indeterminate, true },
        { "a reading on the day before the window end does not mature a good", "2026-03-15", ["2027-03-14 dpd=0"], PerformanceClass.Good, false },
        { "a reading on the last day of the window matures a good", "2026-03-15", ["2027-03-15 dpd=0"], PerformanceClass.Good, true },
        { "a bad read on the last day of the window counts", "2026-03-15", ["2027-01-01 dpd=0", "2027-03-15 dpd=90"], PerformanceClass.Bad, true },
        { "a bad read the day after the window end does not count", "2026-03-15", ["2027-01-01 dpd=0", "2027-03-16 dpd=90"], PerformanceClass.Good, true },
        { "a reading the day after the window end matures the in-window class", "2026-03-15", ["2027-01-01 dpd=45", "2027-03-16 dpd=45"], PerformanceClass.Indeterminate, true },
        { "a bad that cures inside the window stays bad", "2026-03-15", ["2026-09-01 dpd=95", "2027-01-01 dpd=0"], PerformanceClass.Bad, true },
        { "a bad that cures after the window stays bad", "2026-03-15", ["2026-09-01 dpd=95", "2027-06-01 dpd=0"], PerformanceClass.Bad, true },
        { "an explicit good after an in-window bad does not undo the bad", "2026-03-15", ["2026-09-01 dpd=120", "2027-04-01 status=good"], PerformanceClass.Bad, true },
        { "a charge-off inside the window is bad", "2026-03-15", ["2026-12-01 co"], PerformanceClass.Bad, true },
        { "a charge-off after the window leaves the in-window class", "2026-03-15", ["2027-02-01 dpd=10", "2027-05-01 co"], PerformanceClass.Good, true },
        { "with no in-window reading, the first reading after the window stands for it (charge-off: bad)", "2026-03-15", ["2027-04-01 co"], PerformanceClass.Bad, true },
        { "with no in-window reading, a later charge-off after the first post-window reading changes nothing", "2026-03-15", ["2027-04-01 dpd=0", "2027-08-01 co"], PerformanceClass.Good, true },
        { "with no in-window reading, 95 days past due read the day after the window end is bad", "2026-03-15", ["2027-03-16 dpd=95"], PerformanceClass.Bad, true },
        { "a lone reading after the window below 30 days past due is good", "2026-03-15", ["2027-04-01 dpd=0"], PerformanceClass.Good, true },
        { "of several readings after the window, the earliest classifies", "2026-03-15", ["2027-06-01 dpd=95", "2027-04-01 dpd=10"], PerformanceClass.Good, true },
        { "an explicit status is taken as given", "2026-03-15", ["2026-09-01 status=indeterminate"], PerformanceClass.Indeterminate, false },
        { "an explicit good after the window matures as good", "2026-03-15", ["2027-04-01 status=good"], PerformanceClass.Good, true },
        { "an explicit bad after the window is taken as given", "2026-03-15", ["2027-01-01 dpd=0", "2027-04-01 status=bad"], PerformanceClass.Bad, true },
        { "the latest reading in the window decides when none is bad", "2026-03-15", ["2026-09-01 dpd=45", "2027-01-01 status=good"], PerformanceClass.Good, false },
        { "the latest by observation date decides, not the latest posted", "2026-03-15", ["2027-01-01 dpd=45", "2026-09-01 dpd=0"], PerformanceClass.Indeterminate, false },
        { "on the same date the reading posted last decides", "2026-03-15", ["2027-01-01 dpd=45", "2027-01-01 status=good"], PerformanceClass.Good, false },
        { "a window crossing a month end clamps 31 August + 12 months to 31 August", "2026-08-31", ["2027-08-31 dpd=0"], PerformanceClass.Good, true },
        { "29 February + 12 months ends on 28 February", "2028-02-29", ["2029-02-28 dpd=0"], PerformanceClass.Good, true },
        { "29 February + 12 months is not yet ended on 27 February", "2028-02-29", ["2029-02-27 dpd=0"], PerformanceClass.Good, false },
        { "a window ending in a leap year ends on 29 February, not 28", "2027-02-28", ["2028-02-28 dpd=0"], PerformanceClass.Good, true },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Classify_ByRule_GivesClassAndMaturity(string rule, string applicationDate, string[] readings, PerformanceClass expected, bool matured)
    {
        var outcome = OutcomeClassifier.Classify(Rule, Date(applicationDate), readings.Select(Parse));

        Assert.NotNull(outcome);
        Assert.True(expected == outcome.Value.Class, $"{rule}: expected {expected}, got {outcome.Value.Class}");
        Assert.True(matured == outcome.Value.Matured, $"{rule}: expected matured {matured}, got {outcome.Value.Matured}");
    }

    [Fact]
    public void Classify_NoReadings_GivesNull()
    {
        Assert.Null(OutcomeClassifier.Classify(Rule, Date("2026-03-15"), []));
    }

    [Fact]
    public void Classify_SeveralReadings_ReportsTheLatestObservationDate()
    {
        var outcome = OutcomeClassifier.Classify(Rule, Date("2026-03-15"), [Parse("2027-01-01 dpd=0"), Parse("2026-09-01 dpd=0")]);

        Assert.Equal(Date("2027-01-01"), outcome!.Value.ObservedAt);
    }

    [Fact]
    public void Classify_WindowOf11MonthsFrom31March_EndsOn29FebruaryInALeapYear()
    {
        var rule = Rule with { PerformanceWindowMonths = 11 };

        var onTheDay = OutcomeClassifier.Classify(rule, Date("2027-03-31"), [Parse("2028-02-29 dpd=0")]);
        var dayBefore = OutcomeClassifier.Classify(rule, Date("2027-03-31"), [Parse("2028-02-28 dpd=0")]);

        Assert.True(onTheDay!.Value.Matured);
        Assert.False(dayBefore!.Value.Matured);
    }

    internal static OutcomeReading Parse(string text)
    {
        var parts = text.Split(' ');
        var at = Date(parts[0]);
        return parts[1] switch
        {
            "co" => new OutcomeReading(at, null, true, null),
            var p when p.StartsWith("dpd=", StringComparison.Ordinal) => new OutcomeReading(at, int.Parse(p[4..], CultureInfo.InvariantCulture), null, null),
            var p when p.StartsWith("status=", StringComparison.Ordinal) && OutcomeReadingCheck.TryParseStatus(p[7..], out var status) => new OutcomeReading(at, null, null, status),
            _ => throw new ArgumentException($"Unknown reading '{text}'.", nameof(text)),
        };
    }

    internal static DateOnly Date(string text) => DateOnly.ParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture);
}
