using Ledgerline.Api.Data.Postgres;
using Ledgerline.Api.Data.Sqlite;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Data;

/// <summary>Registers the store chosen by <c>Database:Provider</c>.</summary>
public static class DataRegistration
{
    public const string ConnectionStringName = "Ledgerline";

    public const string DefaultSqliteConnectionString = "Data Source=ledgerline.db";

    public static IHostApplicationBuilder AddLedgerlineData(this IHostApplicationBuilder builder)
    {
        builder.Services.AddOptions<DatabaseOptions>()
            .Bind(builder.Configuration.GetSection(DatabaseOptions.Section))
            .ValidateDataAnnotations()
            .ValidateOnStart();
        var options = builder.Configuration.GetSection(DatabaseOptions.Section).Get<DatabaseOptions>() ?? new DatabaseOptions();
        var connectionString = builder.Configuration.GetConnectionString(ConnectionStringName);
        if (options.IsPostgres)
        {
            if (string.IsNullOrWhiteSpace(connectionString))
            {
                throw new InvalidOperationException(
                    "Database:Provider is Postgres but ConnectionStrings:Ledgerline is empty; set it, e.g. ConnectionStrings__Ledgerline='Host=db;Database=ledgerline;Username=ledgerline;Password=…'.");
            }

            builder.Services.AddDbContextPool<LedgerlineDbContext, PostgresLedgerlineDbContext>(o => o.UseNpgsql(connectionString));
            builder.Services.AddSingleton<StoreDialect, PostgresDialect>();
        }
        else
        {
            var sqlite = string.IsNullOrWhiteSpace(connectionString) ? DefaultSqliteConnectionString : connectionString;
            builder.Services.AddDbContextPool<LedgerlineDbContext, SqliteLedgerlineDbContext>(o => o.UseSqlite(sqlite).AddInterceptors(new SqlitePragmas()));
            builder.Services.AddSingleton<StoreDialect, SqliteDialect>();
            // The write-ahead log's upkeep: checkpoints off the request path, and restarts under load.
            builder.Services.AddSingleton<SqliteLogRestart>();
            builder.Services.AddHostedService<SqliteCheckpointer>();
        }

        builder.Services.AddHealthChecks().AddCheck<DatabaseHealthCheck>("database");
        return builder;
    }

    /// <summary>
    /// Applies migrations where configured (always for SQLite unless turned off). Run before the
    /// service takes requests, so health answers 200 only on a migrated database.
    /// </summary>
    public static async Task MigrateLedgerlineDatabaseAsync(this WebApplication app)
    {
        var options = app.Configuration.GetSection(DatabaseOptions.Section).Get<DatabaseOptions>() ?? new DatabaseOptions();
        if (!(options.MigrateOnStart ?? !options.IsPostgres))
        {
            return;
        }

        await using var scope = app.Services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<LedgerlineDbContext>();
        await StoreDialect.Of(db).PrepareStoreAsync(db, CancellationToken.None);
        await db.Database.MigrateAsync();
    }
}
