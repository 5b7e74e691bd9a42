using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace Ledgerline.Api.Data;

/// <summary>
/// Scores are stored as whole ten-thousandths in a 64-bit integer: exact (points carry at most
/// four decimals), ordered numerically on every provider, and cheap to group by in reports.
/// SQLite would otherwise store decimals as text, which sorts "1000" before "999".
/// </summary>
internal static class ScoreUnits
{
    public const decimal PerPoint = 10_000m;

    public static readonly ValueConverter<decimal, long> Converter =
        new(score => (long)(score * PerPoint), units => units / PerPoint);

    public static readonly ValueConverter<decimal?, long?> NullableConverter =
        new(score => score == null ? null : (long)(score.Value * PerPoint), units => units == null ? null : units.Value / PerPoint);
}
