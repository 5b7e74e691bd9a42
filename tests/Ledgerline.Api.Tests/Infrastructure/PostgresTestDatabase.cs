using System.Data.Common;
using Ledgerline.Api.Data.Postgres;
using Microsoft.EntityFrameworkCore;
using Npgsql;

namespace Ledgerline.Api.Tests.Infrastructure;

/// <summary>
/// A fresh database on the PostgreSQL server named by <c>LEDGERLINE_TEST_POSTGRES</c>, cloned from
/// a template migrated once per test run (cloning takes milliseconds; migrating each database
/// would take most of a second), dropped when the app is disposed.
/// </summary>
public sealed class PostgresTestDatabase : TestDatabase
{
    public const string Variable = "LEDGERLINE_TEST_POSTGRES";

    private static readonly Lazy<string> s_template = new(MigrateTemplate, LazyThreadSafetyMode.ExecutionAndPublication);
    private readonly string _name;

    private PostgresTestDatabase(string name, string connectionString)
    {
        _name = name;
        ConnectionString = connectionString;
    }

    public override string ConnectionString { get; }

    private static string Server => Environment.GetEnvironmentVariable(Variable) is { Length: > 0 } value
        ? value
        : throw new InvalidOperationException(
            $"The PostgreSQL tests need a server: set {Variable} to a connection string whose user may create databases, " +
            "e.g. run them through scripts/with-postgres, which starts a throwaway one.");

    public static PostgresTestDatabase CreateFromTemplate()
    {
        var template = s_template.Value;
        var name = "ledgerline_test_" + Guid.NewGuid().ToString("N");
        Admin($"CREATE DATABASE {name} TEMPLATE {template}");
        return new PostgresTestDatabase(name, For(name));
    }

    public override DbConnection Open()
    {
        var connection = new NpgsqlConnection(ConnectionString);
        connection.Open();
        return connection;
    }

    public override async ValueTask DisposeAsync()
    {
        await using (var connection = new NpgsqlConnection(ConnectionString))
        {
            NpgsqlConnection.ClearPool(connection);
        }

        Admin($"DROP DATABASE IF EXISTS {_name} WITH (FORCE)");
    }

    private static string MigrateTemplate()
    {
        // One template per test process, so concurrent runs on one server do not share it.
        var name = "ledgerline_template_" + Guid.NewGuid().ToString("N");
        Admin($"CREATE DATABASE {name}");
        var connectionString = For(name);
        using (var db = new PostgresLedgerlineDbContext(new DbContextOptionsBuilder<PostgresLedgerlineDbContext>().UseNpgsql(connectionString).Options))
        {
            db.Database.Migrate();
        }

        // A database with open connections cannot serve as a template.
        using (var connection = new NpgsqlConnection(connectionString))
        {
            NpgsqlConnection.ClearPool(connection);
        }

        AppDomain.CurrentDomain.ProcessExit += (_, _) => Admin($"DROP DATABASE IF EXISTS {name} WITH (FORCE)");
        return name;
    }

    private static string For(string database) =>
        new NpgsqlConnectionStringBuilder(Server) { Database = database }.ConnectionString;

    private static void Admin(string sql)
    {
        using var connection = new NpgsqlConnection(new NpgsqlConnectionStringBuilder(Server) { Pooling = false }.ConnectionString);
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
