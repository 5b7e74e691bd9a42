using System.Text;
using System.Text.Json;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>
/// Reads <c>{ "outcomes": [ … ] }</c> with <see cref="Utf8JsonReader"/> over a small, reused
/// buffer, one complete row object at a time, so a 50,000-row body never sits in memory whole.
/// A row with a field of the wrong type is rejected on its own; only a body that is not JSON at
/// all (or not of this shape) stops the whole request.
/// </summary>
internal sealed class OutcomeJsonReader(Stream body, int maxRows) : IOutcomeRowReader
{
    private const int InitialBufferBytes = 64 * 1024;
    private const int MaxRowBytes = 1024 * 1024;

    private byte[] _buffer = new byte[InitialBufferBytes];
    private int _start;
    private int _end;
    private long _bytesRead;
    private bool _final;
    private JsonReaderState _state;
    private Phase _phase = Phase.BeforeBody;
    private int _index;

    private enum Phase
    {
        BeforeBody,
        InBody,
        BeforeArray,
        InArray,
        AfterArray,
        Done,
    }

    public string? Problem { get; private set; }

    public async ValueTask<bool> ReadAsync(List<OutcomeRow> rows, int max, CancellationToken ct)
    {
        var target = rows.Count + max;
        while (true)
        {
            Parse(rows, target);
            if (Problem is not null || _phase == Phase.Done)
            {
                return false;
            }

            if (rows.Count >= target)
            {
                return true;
            }

            if (_final)
            {
                Problem = _bytesRead == 0
                    ? "The body is empty; send { \"outcomes\": [ … ] }."
                    : "The body ended before the outcomes array and the object around it were closed; the request was cut short or is not complete JSON.";
                return false;
            }

            await FillAsync(ct);
        }
    }

    private async ValueTask FillAsync(CancellationToken ct)
    {
        if (_start > 0)
        {
            Buffer.BlockCopy(_buffer, _start, _buffer, 0, _end - _start);
            _end -= _start;
            _start = 0;
        }

        if (_end == _buffer.Length)
        {
            if (_buffer.Length >= MaxRowBytes)
            {
                Problem = $"Row {_index} is longer than {MaxRowBytes / 1024 / 1024} MB; an outcome row is a few fields.";
                return;
            }

            Array.Resize(ref _buffer, _buffer.Length * 2);
        }

        var read = await body.ReadAsync(_buffer.AsMemory(_end), ct);
        _bytesRead += read;
        if (read == 0)
        {
            _final = true;
        }
        else
        {
            _end += read;
        }
    }

    private void Parse(List<OutcomeRow> rows, int target)
    {
        var reader = new Utf8JsonReader(_buffer.AsSpan(_start, _end - _start), _final, _state);
        try
        {
            while (rows.Count < target && Problem is null && _phase != Phase.Done)
            {
                var checkpoint = reader;
                if (!reader.Read())
                {
                    reader = checkpoint;
                    break;
                }

                if (_phase == Phase.InArray)
                {
                    if (reader.TokenType == JsonTokenType.EndArray)
                    {
                        _phase = Phase.AfterArray;
                        continue;
                    }

                    var element = reader;
                    if (reader.TokenType is JsonTokenType.StartObject or JsonTokenType.StartArray && !reader.TrySkip())
                    {
                        // The row is not all in the buffer yet: read it again once more has arrived.
                        reader = checkpoint;
                        break;
                    }

                    if (_index >= maxRows)
                    {
                        Problem = TooManyRows(maxRows);
                        break;
                    }

                    var row = new OutcomeRow { Index = _index++ };
                    if (element.TokenType == JsonTokenType.StartObject)
                    {
                        ReadRow(ref element, row);
                    }
                    else
                    {
                        row.Fail("Each outcome must be a JSON object with applicationId, observedAt and an outcome field.");
                    }

                    row.CheckPresence();
                    rows.Add(row);
                    continue;
                }

                Step(ref reader);
            }
        }
        catch (JsonException e)
        {
            Problem = $"The body is not valid JSON (line {e.LineNumber + 1}, position {e.BytePositionInLine + 1}); nothing was stored.";
            return;
        }

        _state = reader.CurrentState;
        _start += (int)reader.BytesConsumed;
    }

    private void Step(ref Utf8JsonReader reader)
    {
        switch (_phase)
        {
            case Phase.BeforeBody when reader.TokenType == JsonTokenType.StartObject:
                _phase = Phase.InBody;
                break;
            case Phase.BeforeBody:
                Problem = "The body must be a JSON object: { \"outcomes\": [ … ] }.";
                break;
            case Phase.InBody when reader.TokenType == JsonTokenType.PropertyName && reader.ValueTextEquals("outcomes"u8):
                _phase = Phase.BeforeArray;
                break;
            case Phase.BeforeArray when reader.TokenType == JsonTokenType.StartArray:
                _phase = Phase.InArray;
                break;
            case Phase.BeforeArray:
                Problem = "'outcomes' must be an array of rows.";
                break;
            case Phase.InBody or Phase.AfterArray when reader.TokenType == JsonTokenType.PropertyName:
                Problem = $"'{OutcomeFieldText.Shorten(reader.GetString() ?? string.Empty)}' is not a field of this request; the body is {{ \"outcomes\": [ … ] }}.";
                break;
            case Phase.InBody:
                Problem = "The body has no 'outcomes' array; send { \"outcomes\": [ … ] }.";
                break;
            default:
                _phase = Phase.Done;
                break;
        }
    }

    /// <summary>Reads one row object; the whole object is in the buffer (TrySkip succeeded), so skipping a value cannot run short.</summary>
    private static void ReadRow(ref Utf8JsonReader reader, OutcomeRow row)
    {
        while (reader.Read() && reader.TokenType == JsonTokenType.PropertyName)
        {
            if (reader.ValueTextEquals("applicationId"u8))
            {
                reader.Read();
                ReadText(ref reader, row, OutcomeFieldText.ApplicationId, text => row.ApplicationId = text);
            }
            else if (reader.ValueTextEquals("observedAt"u8))
            {
                reader.Read();
                ReadText(ref reader, row, OutcomeFieldText.ObservedAt, text => OutcomeFieldText.SetObservedAt(row, text));
            }
            else if (reader.ValueTextEquals("worstDaysPastDue"u8))
            {
                reader.Read();
                ReadDays(ref reader, row);
            }
            else if (reader.ValueTextEquals("chargedOff"u8))
            {
                reader.Read();
                ReadFlag(ref reader, row);
            }
            else if (reader.ValueTextEquals("status"u8))
            {
                reader.Read();
                ReadText(ref reader, row, OutcomeFieldText.Status, text => OutcomeFieldText.SetStatus(row, text));
            }
            else
            {
                var name = OutcomeFieldText.Shorten(reader.GetString() ?? string.Empty);
                reader.Read();
                _ = reader.TrySkip();
                row.Fail($"'{name}' is not a field of an outcome; the fields are {OutcomeFieldText.FieldList}.");
            }
        }
    }

    private static void ReadText(ref Utf8JsonReader reader, OutcomeRow row, string field, Action<string> set)
    {
        switch (reader.TokenType)
        {
            case JsonTokenType.String:
                set(reader.GetString()!);
                break;
            case JsonTokenType.Null:
                break;
            default:
                _ = reader.TrySkip();
                row.Fail($"{field} must be text in quotes.");
                break;
        }
    }

    private static void ReadDays(ref Utf8JsonReader reader, OutcomeRow row)
    {
        switch (reader.TokenType)
        {
            case JsonTokenType.Number when reader.TryGetInt32(out var days):
                row.WorstDaysPastDue = days;
                break;
            case JsonTokenType.Number:
                row.Fail($"worstDaysPastDue {OutcomeFieldText.Shorten(Encoding.UTF8.GetString(reader.ValueSpan))} is not a whole number of days; expected 0 or more, e.g. 95.");
                break;
            case JsonTokenType.Null:
                break;
            default:
                _ = reader.TrySkip();
                row.Fail("worstDaysPastDue must be a number of days, not in quotes.");
                break;
        }
    }

    private static void ReadFlag(ref Utf8JsonReader reader, OutcomeRow row)
    {
        switch (reader.TokenType)
        {
            case JsonTokenType.True:
                row.ChargedOff = true;
                break;
            case JsonTokenType.False:
                row.ChargedOff = false;
                break;
            case JsonTokenType.Null:
                break;
            default:
                _ = reader.TrySkip();
                row.Fail("chargedOff must be true or false, not in quotes.");
                break;
        }
    }

    public void Dispose()
    {
        // The body stream belongs to the caller.
    }

    internal static string TooManyRows(int maxRows) =>
        $"The body holds more than {maxRows:N0} rows; split it into requests of at most {maxRows:N0} rows. Nothing was stored.";
}
