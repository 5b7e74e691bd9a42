namespace Ledgerline.Scoring.Outcomes;

/// <summary>Whether one reading can be stored for a decision: the rules every posted row must meet.</summary>
public static class OutcomeReadingCheck
{
    /// <summary>Finds the first reason a reading is not acceptable.</summary>
    /// <param name="rule">The scorecard's outcome definition.</param>
    /// <param name="reading">The reading as posted.</param>
    /// <param name="applicationDate">The decision's application date; a reading cannot precede it.</param>
    /// <param name="today">Today's date (UTC); a reading cannot be from the future.</param>
    /// <returns>Null when the reading is acceptable; otherwise what is wrong and what was expected.</returns>
    public static string? Check(OutcomeDefinitionRule rule, OutcomeReading reading, DateOnly applicationDate, DateOnly today)
    {
        if (reading.ObservedAt < applicationDate)
        {
            return $"observedAt {reading.ObservedAt:yyyy-MM-dd} is before the application date {applicationDate:yyyy-MM-dd}; performance is observed on or after it.";
        }

        if (reading.ObservedAt > today)
        {
            return $"observedAt {reading.ObservedAt:yyyy-MM-dd} is in the future (today is {today:yyyy-MM-dd}).";
        }

        return CheckFields(rule, reading);
    }

    /// <summary>Checks the outcome fields of a reading, without its dates.</summary>
    /// <param name="rule">The scorecard's outcome definition.</param>
    /// <param name="reading">The reading as posted.</param>
    /// <returns>Null when the fields are acceptable; otherwise what is wrong.</returns>
    public static string? CheckFields(OutcomeDefinitionRule rule, OutcomeReading reading)
    {
        if (reading.WorstDaysPastDue is < 0)
        {
            return $"worstDaysPastDue must be 0 or more whole days, got {reading.WorstDaysPastDue}.";
        }

        if (reading.WorstDaysPastDue is null && reading.ChargedOff is null && reading.Status is null)
        {
            return "The row gives no outcome: give worstDaysPastDue, chargedOff or status.";
        }

        if (reading.WorstDaysPastDue is null && reading.ChargedOff == false && reading.Status is null)
        {
            return "chargedOff false alone does not classify the account: give worstDaysPastDue or status as well.";
        }

        if (reading.Status is { } status)
        {
            PerformanceClass? implied = reading.ChargedOff == true ? PerformanceClass.Bad
                : reading.WorstDaysPastDue is { } days ? rule.ClassifyDaysPastDue(days)
                : null;
            if (implied is { } shown && shown != status)
            {
                var evidence = reading.ChargedOff == true ? "chargedOff true" : $"worstDaysPastDue {reading.WorstDaysPastDue}";
                return $"status '{Word(status)}' contradicts {evidence}, which is {Word(shown)} under this scorecard's definition (bad from {rule.BadDaysPastDue} days past due, indeterminate from {rule.IndeterminateDaysPastDue}); send one or make them agree.";
            }
        }

        return null;
    }

    /// <summary>The wire word of a class: <c>good</c>, <c>bad</c> or <c>indeterminate</c>.</summary>
    /// <param name="value">The class.</param>
    /// <returns>The lower-case word.</returns>
    public static string Word(PerformanceClass value) => value switch
    {
        PerformanceClass.Good => "good",
        PerformanceClass.Bad => "bad",
        _ => "indeterminate",
    };

    /// <summary>Reads a status word as posted.</summary>
    /// <param name="word">The word; exact, lower case.</param>
    /// <param name="value">The class it names.</param>
    /// <returns>True for <c>good</c>, <c>bad</c> or <c>indeterminate</c>.</returns>
    public static bool TryParseStatus(string word, out PerformanceClass value)
    {
        switch (word)
        {
            case "good":
                value = PerformanceClass.Good;
                return true;
            case "bad":
                value = PerformanceClass.Bad;
                return true;
            case "indeterminate":
                value = PerformanceClass.Indeterminate;
                return true;
            default:
                value = default;
                return false;
        }
    }
}
