using Ledgerline.Scoring.Outcomes;
using static Ledgerline.Scoring.Tests.Outcomes.OutcomeClassifierTests;

namespace Ledgerline.Scoring.Tests.Outcomes;

public sealed class OutcomeDefinitionRuleTests
{
    private static readonly OutcomeDefinitionRule Rule = new(90, 30, 12);

    [Theory]
    [InlineData("the window end is the same day 12 months later", "2026-03-15", "2027-03-15")]
    [InlineData("31 August + 12 months is 31 August", "2026-08-31", "2027-08-31")]
    [InlineData("29 February + 12 months clamps to 28 February", "2028-02-29", "2029-02-28")]
    [InlineData("28 February + 12 months stays on the 28th in a leap year", "2027-02-28", "2028-02-28")]
    public void WindowEnd_ByRule_IsCalendarMonthsLater(string rule, string applicationDate, string expected)
    {
        Assert.True(Date(expected) == Rule.WindowEnd(Date(applicationDate)), rule);
    }

    [Fact]
    public void WindowEnd_OneMonthFrom31January_Is28February()
    {
        Assert.Equal(Date("2026-02-28"), (Rule with { PerformanceWindowMonths = 1 }).WindowEnd(Date("2026-01-31")));
    }

    [Theory]
    [InlineData("2027-03-15")]
    [InlineData("2029-02-28")]
    [InlineData("2028-02-29")]
    [InlineData("2027-02-28")]
    [InlineData("2027-03-01")]
    public void EarliestApplicationDateEndingOnOrAfter_AnyDate_IsTheSmallestSuchDate(string date)
    {
        var day = Date(date);

        var earliest = Rule.EarliestApplicationDateEndingOnOrAfter(day);

        Assert.True(Rule.WindowEnd(earliest) >= day);
        Assert.True(Rule.WindowEnd(earliest.AddDays(-1)) < day);
    }

    [Theory]
    [InlineData(29, PerformanceClass.Good)]
    [InlineData(30, PerformanceClass.Indeterminate)]
    [InlineData(89, PerformanceClass.Indeterminate)]
    [InlineData(90, PerformanceClass.Bad)]
    public void ClassifyDaysPastDue_AtEachThreshold_IsInclusiveFromBelow(int days, PerformanceClass expected)
    {
        Assert.Equal(expected, Rule.ClassifyDaysPastDue(days));
    }
}
