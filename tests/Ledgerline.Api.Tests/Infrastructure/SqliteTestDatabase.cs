using System.Data.Common;
using Microsoft.Data.Sqlite;

namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>A fresh SQLite file in the temporary folder; the app migrates it on start.</summary>
public sealed class SqliteTestDatabase : TestDatabase
{
    private readonly string _path = Path.Combine(Path.GetTempPath(), $"ledgerline-test-{Guid.NewGuid():N}.db");

    public override string ConnectionString => $"Data Source={_path}";

    public override DbConnection Open()
    {
        var connection = new SqliteConnection(ConnectionString);
        connection.Open();
        return connection;
    }

    public override ValueTask DisposeAsync()
    {
        SqliteConnection.ClearAllPools();
        foreach (var suffix in new[] { "", "-wal", "-shm" })
        {
            File.Delete(_path + suffix);
        }

        return ValueTask.CompletedTask;
    }
}
