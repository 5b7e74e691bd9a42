using Ledgerline.Api.Data.Postgres;
using Ledgerline.Api.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace Ledgerline.Api.Data;

/// <summary>Lets <c>dotnet ef</c> build the SQLite context without starting the app.</summary>
internal sealed class SqliteDesignTimeFactory : IDesignTimeDbContextFactory<SqliteLedgerlineDbContext>
{
    public SqliteLedgerlineDbContext CreateDbContext(string[] args) =>
        new(new DbContextOptionsBuilder<SqliteLedgerlineDbContext>().UseSqlite(DataRegistration.DefaultSqliteConnectionString).Options);
}

/// <summary>Lets <c>dotnet ef</c> build the PostgreSQL context; no server is contacted to add a migration.</summary>
internal sealed class PostgresDesignTimeFactory : IDesignTimeDbContextFactory<PostgresLedgerlineDbContext>
{
    public PostgresLedgerlineDbContext CreateDbContext(string[] args) =>
        new(new DbContextOptionsBuilder<PostgresLedgerlineDbContext>().UseNpgsql("Host=localhost;Database=ledgerline").Options);
}
