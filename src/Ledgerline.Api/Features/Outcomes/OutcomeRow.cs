using Ledgerline.Scoring.Outcomes;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>One posted row as read from the body, before it is checked against its decision.</summary>
internal sealed class OutcomeRow
{
    /// <summary>0-based position in the <c>outcomes</c> array, or data row of the CSV (header not counted).</summary>
    public int Index { get; init; }

    public string? ApplicationId { get; set; }

    public DateOnly? ObservedAt { get; set; }

    public int? WorstDaysPastDue { get; set; }

    public bool? ChargedOff { get; set; }

    public PerformanceClass? Status { get; set; }

    /// <summary>The first problem found while reading the row; a row with one is never stored.</summary>
    public string? Error { get; set; }

    public void Fail(string message) => Error ??= message;

    /// <summary>The problems every reader reports the same way, whatever the format.</summary>
    public void CheckPresence()
    {
        if (string.IsNullOrEmpty(ApplicationId))
        {
            Fail("applicationId is missing: every row names the application its outcome belongs to.");
        }
        else if (ApplicationId.Length > 100)
        {
            Fail("applicationId is longer than 100 characters; no decision has such an id.");
        }

        if (ObservedAt is null)
        {
            Fail("observedAt is missing: give the date the account was observed, as yyyy-MM-dd.");
        }
    }
}

/// <summary>Reads the rows of a posted body a chunk at a time, so memory does not grow with the body.</summary>
internal interface IOutcomeRowReader : IDisposable
{
    /// <summary>Set when the body as a whole cannot be read (malformed JSON, a bad CSV header); reading stops.</summary>
    string? Problem { get; }

    /// <summary>Adds up to <paramref name="max"/> rows to <paramref name="rows"/>; false once the body is exhausted or unreadable.</summary>
    ValueTask<bool> ReadAsync(List<OutcomeRow> rows, int max, CancellationToken ct);
}
