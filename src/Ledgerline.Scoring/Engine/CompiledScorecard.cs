using System.Collections.Frozen;
using Ledgerline.Scoring.Scorecards;

namespace Ledgerline.Scoring.Engine;

/// <summary>
/// A validated points table prepared for fast scoring: numeric bin edges as sorted arrays,
/// categories in frozen dictionaries, each characteristic's best points precomputed for reason
/// codes. Thread-safe and immutable; build once per version and share.
/// </summary>
public sealed class CompiledScorecard
{
    private readonly CompiledCharacteristic[] _characteristics;
    private readonly FrozenDictionary<string, int> _indexByName;
    private readonly decimal[] _bandMinimums;
    private readonly Band[] _bands;

    private CompiledScorecard(ScorecardDefinition definition)
    {
        Definition = definition;
        Scaling = new PointsScaling(definition.Scaling);
        _characteristics = definition.Characteristics.Select(c => new CompiledCharacteristic(c)).ToArray();
        _indexByName = definition.Characteristics
            .Select((c, i) => KeyValuePair.Create(c.Name, i))
            .ToFrozenDictionary(StringComparer.Ordinal);
        var bands = definition.DecisionBands;
        _bandMinimums = bands.Take(bands.Count - 1).Select(b => b.MinScore!.Value).ToArray();
        _bands = bands.Select(b => b.Band).ToArray();
    }

    /// <summary>The definition this was compiled from.</summary>
    public ScorecardDefinition Definition { get; }

    /// <summary>The version's points-to-odds scaling.</summary>
    public PointsScaling Scaling { get; }

    /// <summary>Number of characteristics; scoring input spans have this length.</summary>
    public int CharacteristicCount => _characteristics.Length;

    /// <summary>Compiles a definition, or throws <see cref="ArgumentException"/> listing its problems.</summary>
    public static CompiledScorecard Compile(ScorecardDefinition definition)
    {
        var problems = ScorecardValidator.Validate(definition);
        if (problems.Count > 0)
        {
            throw new ArgumentException(
                "The points table is not valid: " + string.Join("; ", problems.Select(p => $"{p.Path}: {p.Message}")),
                nameof(definition));
        }

        return new CompiledScorecard(definition);
    }

    /// <summary>The index of a characteristic in input spans, or -1 when the version does not use it.</summary>
    public int IndexOf(string name) => _indexByName.TryGetValue(name, out var index) ? index : -1;

    /// <summary>The name of the characteristic at an index.</summary>
    public string NameAt(int index) => _characteristics[index].Definition.Name;

    /// <summary>
    /// Scores one application. <paramref name="values"/> holds one value per characteristic in the
    /// version's order (see <see cref="IndexOf"/>). Returns null and sets <paramref name="failure"/>
    /// when a value cannot be scored (wrong type, missing without missing points, unknown category
    /// without other points).
    /// </summary>
    public ScoreResult? Score(ReadOnlySpan<ScoringValue> values, out ScoringFailure? failure)
    {
        if (values.Length != _characteristics.Length)
        {
            throw new ArgumentException($"Expected {_characteristics.Length} values, got {values.Length}.", nameof(values));
        }

        var bins = new int[_characteristics.Length];
        var points = new decimal[_characteristics.Length];
        var total = Definition.BasePoints;
        for (var i = 0; i < _characteristics.Length; i++)
        {
            var characteristic = _characteristics[i];
            if (!characteristic.TryMatch(values[i], out var bin, out var binPoints, out var message))
            {
                failure = new ScoringFailure(characteristic.Definition.Name, message!);
                return null;
            }

            bins[i] = bin;
            points[i] = binPoints;
            total += binPoints;
        }

        failure = null;
        return new ScoreResult(total, Scaling.ProbabilityOfBad(total), BandFor(total), bins, points, RankReasons(bins));
    }

    /// <summary>The decision band a score falls in (bands read top down).</summary>
    public Band BandFor(decimal score)
    {
        for (var i = 0; i < _bandMinimums.Length; i++)
        {
            if (score >= _bandMinimums[i])
            {
                return _bands[i];
            }
        }

        return _bands[^1];
    }

    /// <summary>
    /// Below-maximum reason codes (common industry practice): rank characteristics by their best
    /// points minus the applicant's points, largest first, ties by characteristic order; never a
    /// characteristic that lost nothing; at most the version's reason-code count.
    /// </summary>
    private ReasonCode[] RankReasons(int[] bins)
    {
        var limit = Math.Min(Definition.ReasonCodeCount, _characteristics.Length);
        if (limit == 0)
        {
            return [];
        }

        Span<int> chosen = stackalloc int[limit];
        Span<double> losses = stackalloc double[limit];
        var count = 0;
        for (var i = 0; i < _characteristics.Length; i++)
        {
            var loss = _characteristics[i].LossOf(bins[i]);
            if (loss <= 0 || (count == limit && loss <= losses[count - 1]))
            {
                continue;
            }

            // Insertion into a short list sorted by loss: only a strictly greater loss moves
            // ahead, so equal losses keep characteristic order.
            var position = Math.Min(count, limit - 1);
            while (position > 0 && loss > losses[position - 1])
            {
                chosen[position] = chosen[position - 1];
                losses[position] = losses[position - 1];
                position--;
            }

            chosen[position] = i;
            losses[position] = loss;
            count = Math.Min(count + 1, limit);
        }

        var reasons = new ReasonCode[count];
        for (var r = 0; r < count; r++)
        {
            reasons[r] = _characteristics[chosen[r]].ReasonAt(bins[chosen[r]])!;
        }

        return reasons;
    }
}
