using Ledgerline.Api.Features.Decisions;
using Ledgerline.Scoring.Outcomes;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>Between the stored class and the scoring library's class.</summary>
public static class OutcomeClassMapping
{
    public static OutcomeClass ToStored(this PerformanceClass value) => value switch
    {
        PerformanceClass.Good => OutcomeClass.Good,
        PerformanceClass.Bad => OutcomeClass.Bad,
        _ => OutcomeClass.Indeterminate,
    };

    public static PerformanceClass? ParseStatus(string? word) =>
        word is not null && OutcomeReadingCheck.TryParseStatus(word, out var status) ? status : null;
}
