using System.Globalization;
using Ledgerline.Scoring.Engine;

namespace Ledgerline.Api.Features.Reports;

/// <summary>
/// Counts of matched bins per report period and characteristic, filled one score at a time as the
/// rows stream in: a year of a busy version is close to a million rows, which are never held.
/// Per characteristic the counts run over its bins, then missing, then other.
/// </summary>
public sealed class BinTally(CompiledScorecard compiled, Func<DateOnly, string> periodOf)
{
    private readonly Dictionary<string, long[][]> _byPeriod = new(StringComparer.Ordinal);

    // Each date's period counts, so the period is worked out once per date, not once per row.
    private readonly Dictionary<DateOnly, long[][]> _byDate = [];

    /// <summary>The counts of one period (all zero when no score fell in it).</summary>
    public long[][] For(string period) => _byPeriod.GetValueOrDefault(period) ?? NewCounts();

    /// <summary>Adds one score's matched bins ("3,0,-1,…": bin per characteristic in version order).</summary>
    public void Add(DateOnly date, string matchedBins)
    {
        if (!_byDate.TryGetValue(date, out var counts))
        {
            var period = periodOf(date);
            if (!_byPeriod.TryGetValue(period, out counts))
            {
                _byPeriod[period] = counts = NewCounts();
            }

            _byDate[date] = counts;
        }

        var text = matchedBins.AsSpan();
        for (var i = 0; i < counts.Length && !text.IsEmpty; i++)
        {
            var comma = text.IndexOf(',');
            var part = comma < 0 ? text : text[..comma];
            text = comma < 0 ? [] : text[(comma + 1)..];
            if (!int.TryParse(part, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var bin))
            {
                continue;
            }

            var slot = bin switch
            {
                MatchedBin.Missing => counts[i].Length - 2,
                MatchedBin.Other => counts[i].Length - 1,
                _ => bin,
            };
            if (slot >= 0 && slot < counts[i].Length)
            {
                counts[i][slot]++;
            }
        }
    }

    private long[][] NewCounts() => compiled.Definition.Characteristics.Select(d => new long[d.Bins.Count + 2]).ToArray();
}
