namespace Ledgerline.Scoring.Tests.Statistics;

/// <summary>Relative-tolerance assertions for statistics.</summary>
internal static class Close
{
    /// <summary>Asserts |actual − expected| ≤ tolerance·|expected| (absolute when expected is 0).</summary>
    public static void Relative(double expected, double? actual, double tolerance = 1e-9)
    {
        Assert.NotNull(actual);
        var limit = expected == 0 ? tolerance : tolerance * Math.Abs(expected);
        Assert.True(Math.Abs(actual.Value - expected) <= limit, $"Expected {expected:R}, got {actual.Value:R} (tolerance {tolerance:R} relative).");
    }
}
