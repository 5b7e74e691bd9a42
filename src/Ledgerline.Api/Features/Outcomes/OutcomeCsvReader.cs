using System.Text;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>
/// Reads <c>text/csv</c>: one header row naming the contract's fields, comma separated, then one
/// outcome per line (RFC 4180 quoting within a line; an empty cell is an absent field). Read a
/// line at a time, so memory does not grow with the body.
/// </summary>
internal sealed class OutcomeCsvReader(Stream body, int maxRows) : IOutcomeRowReader
{
    private readonly StreamReader _reader = new(body, Encoding.UTF8, detectEncodingFromByteOrderMarks: true, bufferSize: 64 * 1024, leaveOpen: true);
    private readonly List<string> _fields = [];
    private string[]? _columns;
    private int _index;

    public string? Problem { get; private set; }

    public async ValueTask<bool> ReadAsync(List<OutcomeRow> rows, int max, CancellationToken ct)
    {
        if (_columns is null && !await ReadHeaderAsync(ct))
        {
            return false;
        }

        var target = rows.Count + max;
        while (rows.Count < target)
        {
            var line = await _reader.ReadLineAsync(ct);
            if (line is null)
            {
                return false;
            }

            if (_index >= maxRows)
            {
                Problem = OutcomeJsonReader.TooManyRows(maxRows);
                return false;
            }

            rows.Add(ReadRow(line));
        }

        return true;
    }

    private async ValueTask<bool> ReadHeaderAsync(CancellationToken ct)
    {
        var header = await _reader.ReadLineAsync(ct);
        if (string.IsNullOrWhiteSpace(header))
        {
            Problem = $"The body is empty or starts with a blank line; the first line must be the header, e.g. {OutcomeFieldText.ApplicationId},{OutcomeFieldText.ObservedAt},{OutcomeFieldText.WorstDaysPastDue}.";
            return false;
        }

        if (!Split(header, _fields))
        {
            Problem = "The header has an unclosed quote.";
            return false;
        }

        if (_fields.Count == 1 && header.IndexOfAny([';', '\t', '|']) is var at and >= 0)
        {
            var shown = header[at] == '\t' ? "tabs" : $"'{header[at]}'";
            Problem = $"The header is separated by {shown}; columns must be separated by commas, e.g. {OutcomeFieldText.ApplicationId},{OutcomeFieldText.ObservedAt},{OutcomeFieldText.WorstDaysPastDue}.";
            return false;
        }

        var columns = _fields.Select(f => f.Trim()).ToArray();
        foreach (var column in columns)
        {
            if (column is not (OutcomeFieldText.ApplicationId or OutcomeFieldText.ObservedAt or OutcomeFieldText.WorstDaysPastDue or OutcomeFieldText.ChargedOff or OutcomeFieldText.Status))
            {
                Problem = $"Column '{OutcomeFieldText.Shorten(column)}' is not a field of an outcome; the columns are {OutcomeFieldText.FieldList} (names as written, case matters).";
                return false;
            }

            if (columns.Count(c => c == column) > 1)
            {
                Problem = $"Column '{column}' appears more than once in the header.";
                return false;
            }
        }

        foreach (var required in new[] { OutcomeFieldText.ApplicationId, OutcomeFieldText.ObservedAt })
        {
            if (!columns.Contains(required))
            {
                Problem = $"The header has no '{required}' column; every row needs the application id and the observation date.";
                return false;
            }
        }

        if (!columns.Any(c => c is OutcomeFieldText.WorstDaysPastDue or OutcomeFieldText.ChargedOff or OutcomeFieldText.Status))
        {
            Problem = "The header has none of the outcome columns worstDaysPastDue, chargedOff, status; give at least one.";
            return false;
        }

        _columns = columns;
        return true;
    }

    private OutcomeRow ReadRow(string line)
    {
        var columns = _columns!;
        var row = new OutcomeRow { Index = _index++ };
        if (!Split(line, _fields))
        {
            row.Fail("The row has an unclosed quote.");
        }
        else if (_fields.Count != columns.Length)
        {
            row.Fail($"The row has {_fields.Count} field{(_fields.Count == 1 ? "" : "s")}; the header names {columns.Length} columns, separated by commas.");
        }

        for (var i = 0; i < columns.Length && i < _fields.Count; i++)
        {
            var value = _fields[i];
            if (value.Length == 0)
            {
                continue;
            }

            switch (columns[i])
            {
                case OutcomeFieldText.ApplicationId:
                    row.ApplicationId = value;
                    break;
                case OutcomeFieldText.ObservedAt:
                    OutcomeFieldText.SetObservedAt(row, value);
                    break;
                case OutcomeFieldText.WorstDaysPastDue:
                    OutcomeFieldText.SetWorstDaysPastDue(row, value);
                    break;
                case OutcomeFieldText.ChargedOff:
                    OutcomeFieldText.SetChargedOff(row, value);
                    break;
                default:
                    OutcomeFieldText.SetStatus(row, value);
                    break;
            }
        }

        row.CheckPresence();
        return row;
    }

    /// <summary>Splits one line on commas, honouring double quotes ("" inside quotes is one quote).</summary>
    private static bool Split(string line, List<string> fields)
    {
        fields.Clear();
        var cell = new StringBuilder();
        var quoted = false;
        for (var i = 0; i < line.Length; i++)
        {
            var c = line[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < line.Length && line[i + 1] == '"')
                {
                    cell.Append('"');
                    i++;
                }
                else if (c == '"')
                {
                    quoted = false;
                }
                else
                {
                    cell.Append(c);
                }
            }
            else if (c == '"')
            {
                quoted = true;
            }
            else if (c == ',')
            {
                fields.Add(cell.ToString());
                cell.Clear();
            }
            else
            {
                cell.Append(c);
            }
        }

        fields.Add(cell.ToString());
        return !quoted;
    }

    public void Dispose() => _reader.Dispose();
}
