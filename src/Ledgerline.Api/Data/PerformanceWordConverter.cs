using Ledgerline.Scoring.Outcomes;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace Ledgerline.Api.Data;

/// <summary>An explicit outcome status is stored as the word it was posted as ("good", "bad", "indeterminate").</summary>
internal sealed class PerformanceWordConverter() : ValueConverter<PerformanceClass, string>(value => OutcomeReadingCheck.Word(value), word => Parse(word))
{
    private static PerformanceClass Parse(string word) =>
        OutcomeReadingCheck.TryParseStatus(word, out var value) ? value : throw new InvalidOperationException($"A stored outcome status reads '{word}', which is not a status.");
}
