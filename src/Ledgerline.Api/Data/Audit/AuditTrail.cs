using System.Security.Cryptography;
using System.Text.Json;

namespace Ledgerline.Api.Data.Audit;

/// <summary>
/// Appends audit entries in the same unit of work as the change they describe, so a change and
/// its record commit together or not at all.
/// </summary>
public static class AuditTrail
{
    /// <summary>Adds an entry for <paramref name="content"/> to the pending changes of <paramref name="db"/>.</summary>
    public static void Record(this LedgerlineDbContext db, string actor, string action, string subject, object content, DateTimeOffset at)
    {
        var bytes = JsonSerializer.SerializeToUtf8Bytes(content, JsonSerializerOptions.Web);
        db.AuditEntries.Add(new AuditEntry
        {
            At = at.UtcDateTime,
            Actor = actor,
            Action = action,
            Subject = subject,
            ContentHash = Convert.ToHexStringLower(SHA256.HashData(bytes)),
        });
    }
}
