namespace Ledgerline.Scoring.Outcomes;

/// <summary>The current outcome of one decision, from every reading posted for it.</summary>
/// <param name="Class">The class now; final only when <paramref name="Matured"/>.</param>
/// <param name="Matured">
/// True when the decision went bad inside the window, or a reading dated on or after the window
/// end exists. Only matured decisions enter performance figures.
/// </param>
/// <param name="ObservedAt">The date of the latest reading: the "as at" date of this outcome.</param>
public readonly record struct CurrentOutcome(PerformanceClass Class, bool Matured, DateOnly ObservedAt);

/// <summary>
/// Turns the readings of one decision into its current outcome under the scorecard's outcome
/// definition.
/// </summary>
/// <remarks>
/// The rule, in order:
/// <list type="number">
/// <item>A reading dated on or before the window end (<see cref="OutcomeDefinitionRule.WindowEnd"/>,
/// the window's last day) counts towards the window. So does an explicit status, whatever its date:
/// it is the servicing system's own verdict and is taken as given.</item>
/// <item>Bad is final: once a counting reading is bad (worst days past due at or beyond the bad
/// threshold, charged off, or status bad), the decision is bad and matured, even if later readings
/// show the account cured.</item>
/// <item>Otherwise the latest counting reading decides (by observation date; on the same date, the
/// one posted last).</item>
/// <item>Delinquency readings dated after the window end may report delinquency from after it
/// ("worst so far"), so they never change a class the window's own readings give. When nothing
/// was read inside the window, the earliest reading after it stands for the window, bad included:
/// its "worst so far" covers the whole window, and a servicing run shortly after the window end
/// is how the window's result usually arrives. Later readings after the window change nothing.</item>
/// <item>Matured: bad by rule 2, or any reading dated on or after the window end.</item>
/// </list>
/// </remarks>
public static class OutcomeClassifier
{
    /// <summary>Classifies a decision's readings.</summary>
    /// <param name="rule">The scorecard's outcome definition.</param>
    /// <param name="applicationDate">The decision's application date, from which the window runs.</param>
    /// <param name="readings">Every reading of the decision in the order received; each passed <see cref="OutcomeReadingCheck"/>.</param>
    /// <returns>The current outcome, or null when there are no readings.</returns>
    public static CurrentOutcome? Classify(OutcomeDefinitionRule rule, DateOnly applicationDate, IEnumerable<OutcomeReading> readings)
    {
        var windowEnd = rule.WindowEnd(applicationDate);
        var any = false;
        var bad = false;
        var reachedWindowEnd = false;
        var latest = DateOnly.MinValue;
        DateOnly? decidingDate = null;
        var decidingClass = PerformanceClass.Good;
        DateOnly? earliestLateDate = null;
        var earliestLateClass = PerformanceClass.Good;

        foreach (var reading in readings)
        {
            any = true;
            var shown = rule.Classify(reading);
            if (reading.ObservedAt > latest)
            {
                latest = reading.ObservedAt;
            }

            if (reading.ObservedAt >= windowEnd)
            {
                reachedWindowEnd = true;
            }

            if (reading.ObservedAt <= windowEnd || reading.Status is not null)
            {
                bad |= shown == PerformanceClass.Bad;
                if (decidingDate is null || reading.ObservedAt >= decidingDate)
                {
                    decidingDate = reading.ObservedAt;
                    decidingClass = shown;
                }
            }
            else if (earliestLateDate is null || reading.ObservedAt < earliestLateDate)
            {
                earliestLateDate = reading.ObservedAt;
                earliestLateClass = shown;
            }
        }

        if (!any)
        {
            return null;
        }

        if (bad)
        {
            return new CurrentOutcome(PerformanceClass.Bad, true, latest);
        }

        return new CurrentOutcome(decidingDate is null ? earliestLateClass : decidingClass, reachedWindowEnd, latest);
    }
}
