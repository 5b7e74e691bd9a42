using Ledgerline.Scoring.Outcomes;
using static Ledgerline.Scoring.Tests.Outcomes.OutcomeClassifierTests;

namespace Ledgerline.Scoring.Tests.Outcomes;

public sealed class OutcomeReadingCheckTests
{
    private static readonly OutcomeDefinitionRule Rule = new(90, 30, 12);
    private static readonly DateOnly Application = Date("2026-03-15");
    private static readonly DateOnly Today = Date("2027-06-30");

    [Theory]
    [InlineData("a reading before the application date", "2026-03-14", 0, null, null, "before the application date")]
    [InlineData("a reading in the future", "2027-07-01", 0, null, null, "in the future")]
    [InlineData("negative days past due", "2027-01-01", -1, null, null, "0 or more")]
    [InlineData("no outcome field", "2027-01-01", null, null, null, "gives no outcome")]
    [InlineData("chargedOff false alone", "2027-01-01", null, false, null, "does not classify")]
    [InlineData("status good with 120 days past due", "2027-01-01", 120, null, PerformanceClass.Good, "contradicts worstDaysPastDue 120")]
    [InlineData("status good with a charge-off", "2027-01-01", null, true, PerformanceClass.Good, "contradicts chargedOff true")]
    [InlineData("status bad with 10 days past due", "2027-01-01", 10, null, PerformanceClass.Bad, "contradicts")]
    public void Check_BadReading_SaysWhy(string rule, string observedAt, int? days, bool? chargedOff, PerformanceClass? status, string mention)
    {
        var problem = OutcomeReadingCheck.Check(Rule, new OutcomeReading(Date(observedAt), days, chargedOff, status), Application, Today);

        Assert.True(problem is not null, $"{rule} must be rejected");
        Assert.Contains(mention, problem, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("on the application date", "2026-03-15", 0, null, null)]
    [InlineData("today", "2027-06-30", 0, null, null)]
    [InlineData("status bad with a charge-off agrees", "2027-01-01", null, true, PerformanceClass.Bad)]
    [InlineData("status indeterminate with 45 days past due agrees", "2027-01-01", 45, null, PerformanceClass.Indeterminate)]
    [InlineData("a charge-off with few days past due is bad", "2027-01-01", 5, true, null)]
    public void Check_GoodReading_Passes(string rule, string observedAt, int? days, bool? chargedOff, PerformanceClass? status)
    {
        var problem = OutcomeReadingCheck.Check(Rule, new OutcomeReading(Date(observedAt), days, chargedOff, status), Application, Today);

        Assert.True(problem is null, $"{rule}: {problem}");
    }

    [Theory]
    [InlineData("good", PerformanceClass.Good)]
    [InlineData("bad", PerformanceClass.Bad)]
    [InlineData("indeterminate", PerformanceClass.Indeterminate)]
    public void TryParseStatus_KnownWord_GivesClass(string word, PerformanceClass expected)
    {
        Assert.True(OutcomeReadingCheck.TryParseStatus(word, out var parsed));
        Assert.Equal(expected, parsed);
    }

    [Theory]
    [InlineData("Good")]
    [InlineData("defaulted")]
    [InlineData("")]
    public void TryParseStatus_UnknownWord_Fails(string word)
    {
        Assert.False(OutcomeReadingCheck.TryParseStatus(word, out _));
    }
}
