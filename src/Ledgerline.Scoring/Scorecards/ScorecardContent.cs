using System.Buffers;
using System.Security.Cryptography;
using System.Text.Json;

namespace Ledgerline.Scoring.Scorecards;

/// <summary>
/// The canonical serialisation of a points table and its SHA-256 content hash. The canonical form
/// has a fixed property order, numbers without trailing zeros and category values sorted within
/// their bin, so neither the key order nor the number formatting of a request changes the hash.
/// Characteristic order is kept: it breaks reason-code ties, so it is part of the content.
/// </summary>
public static class ScorecardContent
{
    /// <summary>The canonical JSON bytes (UTF-8) of a definition.</summary>
    public static byte[] CanonicalJson(ScorecardDefinition definition)
    {
        var buffer = new ArrayBufferWriter<byte>(4096);
        using (var w = new Utf8JsonWriter(buffer))
        {
            w.WriteStartObject();
            w.WriteString("description", definition.Description ?? string.Empty);
            WriteNumber(w, "basePoints", definition.BasePoints);
            w.WriteStartObject("scaling");
            WriteNumber(w, "baseScore", definition.Scaling.BaseScore);
            WriteNumber(w, "baseOdds", definition.Scaling.BaseOdds);
            WriteNumber(w, "pointsToDoubleOdds", definition.Scaling.PointsToDoubleOdds);
            w.WriteEndObject();
            w.WriteNumber("reasonCodeCount", definition.ReasonCodeCount);
            w.WriteStartArray("characteristics");
            foreach (var c in definition.Characteristics)
            {
                WriteCharacteristic(w, c);
            }

            w.WriteEndArray();
            w.WriteStartArray("decisionBands");
            foreach (var band in definition.DecisionBands)
            {
                w.WriteStartObject();
                WriteOptional(w, "minScore", band.MinScore);
                w.WriteString("decision", BandNames.ToWire(band.Band));
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return buffer.WrittenSpan.ToArray();
    }

    /// <summary>Lower-case hexadecimal SHA-256 of the canonical JSON.</summary>
    public static string Hash(ScorecardDefinition definition) =>
        Convert.ToHexStringLower(SHA256.HashData(CanonicalJson(definition)));

    private static void WriteCharacteristic(Utf8JsonWriter w, CharacteristicDefinition c)
    {
        w.WriteStartObject();
        w.WriteString("name", c.Name);
        w.WriteString("type", c.Type == CharacteristicType.Numeric ? "numeric" : "categorical");
        w.WriteString("reasonCode", c.ReasonCode);
        w.WriteString("reasonText", c.ReasonText);
        w.WriteStartArray("bins");
        foreach (var bin in c.Bins)
        {
            w.WriteStartObject();
            WriteOptional(w, "from", bin.From);
            WriteOptional(w, "upTo", bin.UpTo);
            if (bin.Values is not null)
            {
                w.WriteStartArray("values");
                foreach (var value in bin.Values.Order(StringComparer.Ordinal))
                {
                    w.WriteStringValue(value);
                }

                w.WriteEndArray();
            }

            WriteNumber(w, "points", bin.Points);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        WriteOptional(w, "missingPoints", c.MissingPoints);
        WriteOptional(w, "otherPoints", c.OtherPoints);
        w.WriteEndObject();
    }

    private static void WriteOptional(Utf8JsonWriter w, string name, decimal? value)
    {
        if (value is { } v)
        {
            WriteNumber(w, name, v);
        }
    }

    private static void WriteNumber(Utf8JsonWriter w, string name, decimal value)
    {
        w.WritePropertyName(name);
        w.WriteRawValue(CanonicalNumber.Format(value), skipInputValidation: true);
    }
}
