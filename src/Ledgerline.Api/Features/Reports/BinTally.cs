using System.Globalization;
using Ledgerline.Scoring.Engine;

namespace Ledgerline.Api.Features.Reports;

/// <summary>
/// Counts of matched bins per application date and characteristic, filled one score at a time as
/// the rows stream in: a year of a busy version is close to a million rows, which are never held.
/// Per characteristic the counts run over its bins, then missing, then other.
/// </summary>
public sealed class BinTally(CompiledScorecard compiled)
{
    private readonly Dictionary<DateOnly, long[][]> _byDate = [];

    public IEnumerable<KeyValuePair<DateOnly, long[][]>> Days => _byDate;

    public long[][] NewCounts() => compiled.Definition.Characteristics.Select(d => new long[d.Bins.Count + 2]).ToArray();

    /// <summary>Adds one score's matched bins ("3,0,-1,…": bin per characteristic in version order).</summary>
    public void Add(DateOnly date, string matchedBins)
    {
        if (!_byDate.TryGetValue(date, out var counts))
        {
            _byDate[date] = counts = NewCounts();
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

    public static void AddInto(long[][] total, long[][] counts)
    {
        for (var i = 0; i < total.Length; i++)
        {
            for (var j = 0; j < total[i].Length; j++)
            {
                total[i][j] += counts[i][j];
            }
        }
    }
}
