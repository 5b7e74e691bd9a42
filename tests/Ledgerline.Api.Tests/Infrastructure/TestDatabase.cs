using System.Data.Common;

namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>
/// One test app's own fresh database. The SQLite project uses a file per app; the PostgreSQL
/// project (compiled from the same sources with <c>POSTGRES</c> defined) a database per app on the
/// server named by <c>LEDGERLINE_TEST_POSTGRES</c>.
/// </summary>
public abstract class TestDatabase : IAsyncDisposable
{
    /// <summary>The provider every test app in this run uses.</summary>
    public const string Provider =
#if POSTGRES
        "Postgres";
#else
        "Sqlite";
#endif

    public abstract string ConnectionString { get; }

    public static bool IsPostgres => Provider == "Postgres";

    public static TestDatabase Create() =>
#if POSTGRES
        PostgresTestDatabase.CreateFromTemplate();
#else
        new SqliteTestDatabase();
#endif

    /// <summary>An open connection straight to the database, bypassing the app.</summary>
    public abstract DbConnection Open();

    public abstract ValueTask DisposeAsync();
}
