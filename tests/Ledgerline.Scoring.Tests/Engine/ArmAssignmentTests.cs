using System.Globalization;
using Ledgerline.Scoring.Engine;
using MathNet.Numerics.Distributions;

namespace Ledgerline.Scoring.Tests.Engine;

public sealed class ArmAssignmentTests
{
    private const string Salt = "00112233445566778899aabbccddeeff";

    // Independent known answers: Python 3 hashlib, computed as
    // int.from_bytes(sha256(salt.encode() + b"\0" + key.encode()).digest()[:8], "big") >> 11, then / 2**53.
    // A change to the byte layout would reshuffle running experiments; these catch it.
    [Theory]
    [InlineData("00112233445566778899aabbccddeeff", "APP-0001234", 4377659947568772L)]
    [InlineData("00112233445566778899aabbccddeeff", "CUST-0042", 8899227686638417L)]
    [InlineData("9f8e7d6c5b4a39281706f5e4d3c2b1a0", "APP-0001234", 8656283184011408L)]
    [InlineData("9f8e7d6c5b4a39281706f5e4d3c2b1a0", "", 5267220308003516L)]
    [InlineData("9f8e7d6c5b4a39281706f5e4d3c2b1a0", "Zoë-ünïcode-7", 7565125369558189L)]
    public void Uniform_GoldenKeys_MatchIndependentComputation(string salt, string key, long numerator)
    {
        Assert.Equal(numerator / 9007199254740992.0, ArmAssignment.Uniform(salt, key));
    }

    /// <summary>
    /// A key too long for a stack buffer takes another path through the hash; its answer must be the
    /// one Python 3 hashlib gives (same formula as above, key = 5,000 × "k").
    /// </summary>
    [Fact]
    public void Uniform_LongKey_MatchesIndependentComputation()
    {
        var key = new string('k', 5000);

        Assert.Equal(7616948012365573L / 9007199254740992.0, ArmAssignment.Uniform(Salt, key));
    }

    [Theory]
    [InlineData(0.0, 0)]
    [InlineData(0.1999999, 0)]
    [InlineData(0.2, 1)]
    [InlineData(0.2999999, 1)]
    [InlineData(0.3, -1)]
    [InlineData(0.9999999, -1)]
    public void Choose_CumulativeShares_ChallengersFirstThenChampion(double u, int expected)
    {
        Assert.Equal(expected, ArmAssignment.Choose(u, [0.2m, 0.1m]));
    }

    [Fact]
    public void Choose_NoChallengers_AlwaysChampion()
    {
        Assert.Equal(-1, ArmAssignment.Choose(0.0, []));
    }

    /// <summary>
    /// Pearson's chi-square goodness-of-fit test (Pearson 1900); the p-value from MathNet.Numerics
    /// 5.0 ChiSquared.CDF. 100,000 keys under a 70/20/10 plan (champion 0.7, challengers 0.2 and 0.1).
    /// </summary>
    [Fact]
    public void Assignment_HundredThousandKeys_SplitPassesChiSquareAtAlpha0001()
    {
        var counts = new long[3];
        foreach (var arm in Arms(100_000))
        {
            counts[arm]++;
        }

        var p = 1 - ChiSquared.CDF(2, ChiSquare(counts, [0.7, 0.2, 0.1]));

        Assert.True(p > 0.001, $"split {string.Join("/", counts)} has p = {p}");
    }

    /// <summary>
    /// Arms must not depend on the keys' order: a chi-square test of independence (Pearson 1900)
    /// between the arm and the key's position (ten consecutive blocks of 10,000 sequential ids),
    /// and between the arms of consecutive keys; p-values from MathNet.Numerics 5.0.
    /// </summary>
    [Fact]
    public void Assignment_SequentialKeys_ArmIndependentOfOrder()
    {
        var arms = Arms(100_000).ToArray();
        var byBlock = new long[10, 3];
        var byPrevious = new long[3, 3];
        for (var i = 0; i < arms.Length; i++)
        {
            byBlock[i / 10_000, arms[i]]++;
            if (i > 0)
            {
                byPrevious[arms[i - 1], arms[i]]++;
            }
        }

        var pBlock = 1 - ChiSquared.CDF(9 * 2, Independence(byBlock));
        var pLag = 1 - ChiSquared.CDF(2 * 2, Independence(byPrevious));

        Assert.True(pBlock > 0.001, $"arm depends on key position: p = {pBlock}");
        Assert.True(pLag > 0.001, $"arm depends on the previous key's arm: p = {pLag}");
    }

    /// <summary>0 champion, 1 first challenger (0.2), 2 second challenger (0.1).</summary>
    private static IEnumerable<int> Arms(int n)
    {
        for (var i = 0; i < n; i++)
        {
            var key = "APP-" + i.ToString("D7", CultureInfo.InvariantCulture);
            yield return ArmAssignment.Choose(ArmAssignment.Uniform(Salt, key), [0.2m, 0.1m]) + 1;
        }
    }

    private static double ChiSquare(long[] observed, double[] shares)
    {
        var n = observed.Sum();
        return observed.Select((o, i) => Math.Pow(o - (n * shares[i]), 2) / (n * shares[i])).Sum();
    }

    private static double Independence(long[,] table)
    {
        int rows = table.GetLength(0), columns = table.GetLength(1);
        var rowTotals = new double[rows];
        var columnTotals = new double[columns];
        double n = 0;
        for (var r = 0; r < rows; r++)
        {
            for (var c = 0; c < columns; c++)
            {
                rowTotals[r] += table[r, c];
                columnTotals[c] += table[r, c];
                n += table[r, c];
            }
        }

        var statistic = 0.0;
        for (var r = 0; r < rows; r++)
        {
            for (var c = 0; c < columns; c++)
            {
                var expected = rowTotals[r] * columnTotals[c] / n;
                statistic += Math.Pow(table[r, c] - expected, 2) / expected;
            }
        }

        return statistic;
    }
}
