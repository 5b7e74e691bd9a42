using System.Collections.Frozen;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Engine;

internal sealed class CompiledCharacteristic
{
    // Upper edges of every numeric bin but the last, ascending: a value belongs to the first bin
    // whose upper edge lies above it ([from, upTo) bins).
    private readonly decimal[] _upperEdges;
    private readonly decimal[] _binPoints;
    private readonly FrozenDictionary<string, int>? _binByCategory;

    public CompiledCharacteristic(CharacteristicDefinition definition)
    {
        Definition = definition;
        _binPoints = definition.Bins.Select(b => b.Points).ToArray();
        if (definition.Type == CharacteristicType.Numeric)
        {
            _upperEdges = definition.Bins.Take(definition.Bins.Count - 1).Select(b => b.UpTo!.Value).ToArray();
        }
        else
        {
            _upperEdges = [];
            _binByCategory = definition.Bins
                .SelectMany((b, i) => b.Values!.Select(v => KeyValuePair.Create(v, i)))
                .ToFrozenDictionary(StringComparer.Ordinal);
        }

        var best = _binPoints.Max();
        if (definition.MissingPoints is { } missing)
        {
            best = Math.Max(best, missing);
        }

        if (definition.OtherPoints is { } other)
        {
            best = Math.Max(best, other);
        }

        MaxPoints = best;

        // Losses below the best points depend only on the matched bin, so each bin's reason code
        // is built once here; scoring then only ranks. Losses rank as doubles: points carry at
        // most four decimals within ±1e9 (validated), so distinct losses stay distinct and ordered.
        _reasonByBin = _binPoints.Select(ReasonFor).ToArray();
        _lossByBin = _reasonByBin.Select(r => r is null ? 0 : (double)r.PointsBelowMax).ToArray();
        _reasonMissing = definition.MissingPoints is { } m ? ReasonFor(m) : null;
        _reasonOther = definition.OtherPoints is { } o ? ReasonFor(o) : null;
    }

    private readonly ReasonCode?[] _reasonByBin;
    private readonly double[] _lossByBin;
    private readonly ReasonCode? _reasonMissing;
    private readonly ReasonCode? _reasonOther;

    /// <summary>How many points below its best the matched bin leaves the applicant (0 at the best).</summary>
    public double LossOf(int bin) => bin switch
    {
        MatchedBin.Missing => _reasonMissing is null ? 0 : (double)_reasonMissing.PointsBelowMax,
        MatchedBin.Other => _reasonOther is null ? 0 : (double)_reasonOther.PointsBelowMax,
        _ => _lossByBin[bin],
    };

    /// <summary>The reason code for the matched bin, or null when it lost nothing.</summary>
    public ReasonCode? ReasonAt(int bin) => bin switch
    {
        MatchedBin.Missing => _reasonMissing,
        MatchedBin.Other => _reasonOther,
        _ => _reasonByBin[bin],
    };

    private ReasonCode? ReasonFor(decimal points)
    {
        var loss = MaxPoints - points;
        return loss > 0
            ? new ReasonCode(Definition.ReasonCode, Definition.Name, Definition.ReasonText, CanonicalNumber.Normalize(loss))
            : null;
    }

    public CharacteristicDefinition Definition { get; }

    /// <summary>The best points this characteristic can give; reason codes measure losses from it.</summary>
    public decimal MaxPoints { get; }

    public bool TryMatch(in ScoringValue value, out int bin, out decimal points, out string? message)
    {
        message = null;
        switch (value.Kind)
        {
            case ScoringValueKind.Missing:
                if (Definition.MissingPoints is { } missing)
                {
                    bin = MatchedBin.Missing;
                    points = missing;
                    return true;
                }

                return Fail("is missing, and this characteristic gives no missingPoints: send a value", out bin, out points, out message);

            case ScoringValueKind.Number when Definition.Type == CharacteristicType.Numeric:
                bin = FindNumericBin(value.Number);
                points = _binPoints[bin];
                return true;

            case ScoringValueKind.Text when Definition.Type == CharacteristicType.Categorical:
                if (_binByCategory!.TryGetValue(value.Text!, out bin))
                {
                    points = _binPoints[bin];
                    return true;
                }

                if (Definition.OtherPoints is { } other)
                {
                    bin = MatchedBin.Other;
                    points = other;
                    return true;
                }

                return Fail($"has the value '{value.Text}', which no bin lists, and this characteristic gives no otherPoints; expected one of: {ListCategories()}",
                    out bin, out points, out message);

            case ScoringValueKind.Text:
                return Fail($"is numeric, but got the text '{value.Text}': send a number", out bin, out points, out message);

            default:
                return Fail($"is categorical, but got the number {value}: send the category as text", out bin, out points, out message);
        }
    }

    private int FindNumericBin(decimal number)
    {
        var edges = _upperEdges;
        int low = 0, high = edges.Length;
        while (low < high)
        {
            var mid = (low + high) >>> 1;
            if (number < edges[mid])
            {
                high = mid;
            }
            else
            {
                low = mid + 1;
            }
        }

        return low;
    }

    private string ListCategories()
    {
        var values = _binByCategory!.Keys.Order(StringComparer.Ordinal).Take(20).Select(v => $"'{v}'");
        var text = string.Join(", ", values);
        return _binByCategory.Count > 20 ? text + ", …" : text;
    }

    private static bool Fail(string message, out int bin, out decimal points, out string? messageOut)
    {
        bin = 0;
        points = 0;
        messageOut = message;
        return false;
    }
}
