using Ledgerline.Scoring.Engine;
using Ledgerline.Scoring.Statistics;

namespace Ledgerline.Scoring.Scorecards;

/// <summary>Aggregates a scored development sample into a <see cref="BaselineAggregates"/>; the rows themselves are not kept.</summary>
public sealed class BaselineBuilder
{
    private readonly CompiledScorecard _scorecard;
    private readonly SortedDictionary<decimal, (long Count, long Bads)> _histogram = [];
    private readonly long[][] _binCounts;
    private readonly long[] _missing;
    private readonly long[] _other;
    private long _rows;
    private long _rowsWithOutcome;
    private long _bads;

    /// <summary>Starts an empty baseline for a version.</summary>
    public BaselineBuilder(CompiledScorecard scorecard)
    {
        _scorecard = scorecard;
        var characteristics = scorecard.Definition.Characteristics;
        _binCounts = characteristics.Select(c => new long[c.Bins.Count]).ToArray();
        _missing = new long[characteristics.Count];
        _other = new long[characteristics.Count];
    }

    /// <summary>Adds one scored development row; <paramref name="bad"/> is null when the row has no outcome.</summary>
    public void Add(ScoreResult result, bool? bad)
    {
        _rows++;
        if (bad is { } isBad)
        {
            _rowsWithOutcome++;
            if (isBad)
            {
                _bads++;
            }
        }

        var key = CanonicalNumber.Normalize(result.Score);
        _histogram.TryGetValue(key, out var cell);
        _histogram[key] = (cell.Count + 1, cell.Bads + (bad == true ? 1 : 0));
        for (var i = 0; i < result.MatchedBins.Length; i++)
        {
            switch (result.MatchedBins[i])
            {
                case MatchedBin.Missing: _missing[i]++; break;
                case MatchedBin.Other: _other[i]++; break;
                default: _binCounts[i][result.MatchedBins[i]]++; break;
            }
        }
    }

    /// <summary>True when some but not all rows carried an outcome (outcomes must be all or none).</summary>
    public bool HasPartialOutcomes => _rowsWithOutcome > 0 && _rowsWithOutcome < _rows;

    /// <summary>
    /// Builds the aggregates. Score bin edges are <paramref name="edges"/> when given (ascending),
    /// otherwise the deciles of the development scores (linear interpolation, R type 7), with
    /// repeated edges dropped. <paramref name="discrimination"/> computes AUC/KS from the histogram
    /// when the sample carried outcomes.
    /// </summary>
    public BaselineAggregates Build(IReadOnlyList<decimal>? edges, Func<IReadOnlyList<DevelopmentScoreCount>, DevelopmentDiscrimination?> discrimination)
    {
        if (_rows == 0)
        {
            throw new InvalidOperationException("A baseline needs at least one development row.");
        }

        var withOutcomes = _rowsWithOutcome == _rows;
        var histogram = _histogram.Select(h => new DevelopmentScoreCount(h.Key, h.Value.Count, withOutcomes ? h.Value.Bads : null)).ToList();
        var cuts = edges ?? DecileEdges(histogram);
        var bins = new List<ScoreBinCount>(cuts.Count + 1);
        var position = 0;
        for (var b = 0; b <= cuts.Count; b++)
        {
            long count = 0, bads = 0;
            while (position < histogram.Count && (b == cuts.Count || histogram[position].Score <= cuts[b]))
            {
                count += histogram[position].Count;
                bads += histogram[position].Bads ?? 0;
                position++;
            }

            bins.Add(new ScoreBinCount(b < cuts.Count ? cuts[b] : null, count, (double)count / _rows, withOutcomes ? bads : null));
        }

        var characteristics = _scorecard.Definition.Characteristics
            .Select((c, i) => new CharacteristicDistribution(c.Name, _binCounts[i], _missing[i], _other[i]))
            .ToList();
        return new BaselineAggregates(
            _rows,
            withOutcomes ? _bads : null,
            edges is null ? "deciles" : "given",
            bins,
            histogram,
            characteristics,
            withOutcomes ? discrimination(histogram) : null);
    }

    /// <summary>
    /// Deciles by linear interpolation between order statistics (Hyndman &amp; Fan 1996, type 7;
    /// R's default), rounded to the points' precision, with repeated edges dropped.
    /// </summary>
    private static List<decimal> DecileEdges(List<DevelopmentScoreCount> histogram)
    {
        var cuts = ScoreBinning.QuantileCutPoints(histogram.Select(h => new ScoreFrequency((double)h.Score, h.Count)));
        var edges = new List<decimal>(cuts.Count);
        foreach (var cut in cuts)
        {
            var edge = CanonicalNumber.Normalize(decimal.Round((decimal)cut, ScorecardValidator.MaxPointsDecimals));
            if (edges.Count == 0 || edge > edges[^1])
            {
                edges.Add(edge);
            }
        }

        return edges;
    }
}
