using System.Buffers;
using System.Buffers.Binary;
using System.Security.Cryptography;
using System.Text;

namespace Ledgerline.Scoring.Engine;

/// <summary>
/// Deterministic, reproducible assignment of an application to an arm of a traffic plan. The same
/// salt and key give the same number on any machine, any day, in any process.
/// </summary>
/// <remarks>
/// Byte layout, fixed forever (changing it reshuffles every running experiment):
/// <c>digest = SHA-256( UTF-8(salt) ‖ 0x00 ‖ UTF-8(key) )</c>; the first 8 bytes of the digest
/// are read as an unsigned big-endian 64-bit integer, its top 53 bits kept (<c>&gt;&gt; 11</c>), and
/// divided by 2^53, giving a double in [0, 1) on an exact grid of 2^-53. The salt is
/// server-generated hexadecimal and holds no 0x00 byte, so the separator makes the layout
/// unambiguous whatever the key holds.
/// </remarks>
public static class ArmAssignment
{
    private const double TwoToThe53 = 9007199254740992.0;

    /// <summary>The uniform number in [0, 1) for a key under a salt (see the remarks for the byte layout).</summary>
    public static double Uniform(string salt, string key)
    {
        ArgumentNullException.ThrowIfNull(salt);
        ArgumentNullException.ThrowIfNull(key);
        var length = Encoding.UTF8.GetByteCount(salt) + 1 + Encoding.UTF8.GetByteCount(key);
        var rented = length <= 512 ? null : ArrayPool<byte>.Shared.Rent(length);
        var buffer = rented is null ? stackalloc byte[length] : rented.AsSpan(0, length);
        try
        {
            var written = Encoding.UTF8.GetBytes(salt, buffer);
            buffer[written++] = 0;
            Encoding.UTF8.GetBytes(key, buffer[written..]);
            Span<byte> digest = stackalloc byte[SHA256.HashSizeInBytes];
            SHA256.HashData(buffer, digest);
            var top = BinaryPrimitives.ReadUInt64BigEndian(digest) >> 11;
            return top / TwoToThe53;
        }
        finally
        {
            if (rented is not null)
            {
                ArrayPool<byte>.Shared.Return(rented);
            }
        }
    }

    /// <summary>
    /// The arm a uniform number falls in: challengers in plan order take [0, s1), [s1, s1+s2), …;
    /// the champion takes the rest, [Σs, 1). Returns the challenger's index, or -1 for the champion.
    /// Shares are summed exactly as decimals and compared as doubles.
    /// </summary>
    /// <param name="uniform">A number in [0, 1), normally from <see cref="Uniform"/>.</param>
    /// <param name="challengerShares">Each challenger's share, in plan order; each in (0, 1), summing below 1.</param>
    public static int Choose(double uniform, ReadOnlySpan<decimal> challengerShares)
    {
        var cumulative = 0m;
        for (var i = 0; i < challengerShares.Length; i++)
        {
            cumulative += challengerShares[i];
            if (uniform < (double)cumulative)
            {
                return i;
            }
        }

        return -1;
    }
}
