using System.Data.Common;
using Microsoft.EntityFrameworkCore.Diagnostics;

namespace Ledgerline.Api.Data.Sqlite;

/// <summary>
/// Every SQLite connection runs with full synchronous writes, so a committed decision survives a
/// power cut, and waits for the write lock instead of failing at once. WAL itself is a property
/// of the file, set when the database is migrated. Checkpoints run in the background
/// (<see cref="SqliteCheckpointer"/>), not inside whichever commit happens to fill the log.
/// </summary>
internal sealed class SqlitePragmas : DbConnectionInterceptor
{
    private const string Pragmas = "PRAGMA synchronous=FULL; PRAGMA busy_timeout=30000; PRAGMA foreign_keys=ON; PRAGMA wal_autocheckpoint=0;";

    public override void ConnectionOpened(DbConnection connection, ConnectionEndEventData eventData)
    {
        using var command = connection.CreateCommand();
        command.CommandText = Pragmas;
        command.ExecuteNonQuery();
    }

    public override async Task ConnectionOpenedAsync(DbConnection connection, ConnectionEndEventData eventData, CancellationToken cancellationToken = default)
    {
        await using var command = connection.CreateCommand();
        command.CommandText = Pragmas;
        await command.ExecuteNonQueryAsync(cancellationToken);
    }
}
