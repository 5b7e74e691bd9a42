using System.Security.Cryptography;

namespace Ledgerline.Api.Features.Outcomes;

/// <summary>
/// The request body copied to a temporary file (deleted on dispose) before any row is written,
/// with its size checked and its SHA-256 taken on the way. Rows are then written in one
/// transaction that never waits on a slow upload, and the memory used does not depend on the
/// body's size.
/// </summary>
internal sealed class SpooledBody : IAsyncDisposable
{
    private SpooledBody(Stream content, string sha256, long bytes)
    {
        Content = content;
        Sha256 = sha256;
        Bytes = bytes;
    }

    public Stream Content { get; }

    public string Sha256 { get; }

    public long Bytes { get; }

    /// <summary>Copies the body; null when it is longer than <paramref name="limitBytes"/>.</summary>
    public static async Task<SpooledBody?> CopyAsync(Stream body, long limitBytes, CancellationToken ct)
    {
        var path = Path.Combine(Path.GetTempPath(), "ledgerline-outcomes-" + Path.GetRandomFileName());
        var file = new FileStream(path, FileMode.CreateNew, FileAccess.ReadWrite, FileShare.None, 64 * 1024, FileOptions.DeleteOnClose | FileOptions.Asynchronous);
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        var buffer = new byte[64 * 1024];
        long total = 0;
        int read;
        while ((read = await body.ReadAsync(buffer, ct)) > 0)
        {
            total += read;
            if (total > limitBytes)
            {
                await file.DisposeAsync();
                return null;
            }

            hash.AppendData(buffer, 0, read);
            await file.WriteAsync(buffer.AsMemory(0, read), ct);
        }

        file.Position = 0;
        return new SpooledBody(file, Convert.ToHexStringLower(hash.GetHashAndReset()), total);
    }

    public ValueTask DisposeAsync() => Content.DisposeAsync();
}
