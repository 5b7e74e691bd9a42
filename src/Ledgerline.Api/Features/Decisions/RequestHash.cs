using System.Buffers;
using System.Security.Cryptography;
using System.Text.Json;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Api.Features.Decisions;

/// <summary>
/// SHA-256 (hex) of a canonical form of a decision request: fields in a fixed order,
/// characteristics sorted by name (ordinal), numbers in canonical decimal form (30, 30.0 and 3e1
/// agree). Two bodies that mean the same hash the same, whatever their key order or spacing.
/// </summary>
public static class RequestHash
{
    public static string Of(DecisionRequest request)
    {
        var buffer = new ArrayBufferWriter<byte>(512);
        using (var writer = new Utf8JsonWriter(buffer))
        {
            writer.WriteStartObject();
            writer.WriteString("applicationId", request.ApplicationId);
            writer.WriteString("assignmentKey", request.AssignmentKey);
            writer.WriteString("applicationDate", request.ApplicationDate);
            writer.WriteStartObject("characteristics");
            var characteristics = request.Characteristics ?? [];
            var names = characteristics.Keys.ToArray();
            Array.Sort(names, StringComparer.Ordinal);
            foreach (var name in names)
            {
                writer.WritePropertyName(name);
                WriteCanonical(writer, characteristics[name]);
            }

            writer.WriteEndObject();
            writer.WriteEndObject();
        }

        return Convert.ToHexStringLower(SHA256.HashData(buffer.WrittenSpan));
    }

    private static void WriteCanonical(Utf8JsonWriter writer, JsonElement value)
    {
        switch (value.ValueKind)
        {
            case JsonValueKind.Number when value.TryGetDecimal(out var number):
                // The canonical form is a plain JSON number by construction; checking it again cost
                // a parse per number on the hot path.
                writer.WriteRawValue(CanonicalNumber.Format(number), skipInputValidation: true);
                break;
            case JsonValueKind.String:
                writer.WriteStringValue(value.GetString());
                break;
            case JsonValueKind.Null:
                writer.WriteNullValue();
                break;
            default:
                // Other kinds are refused before a decision is logged; hash them as sent.
                value.WriteTo(writer);
                break;
        }
    }
}
