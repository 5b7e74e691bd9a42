using System.ComponentModel.DataAnnotations;

namespace Ledgerline.Api.Data;

/// <summary>The <c>Database</c> configuration section.</summary>
public sealed class DatabaseOptions
{
    public const string Section = "Database";

    /// <summary><c>Sqlite</c> (default) or <c>Postgres</c>.</summary>
    [RegularExpression("^(Sqlite|Postgres)$", ErrorMessage = "Database:Provider must be 'Sqlite' or 'Postgres'.")]
    public string Provider { get; set; } = "Sqlite";

    /// <summary>
    /// Apply pending migrations when the service starts. On by default for SQLite (one process
    /// owns the file); PostgreSQL migrations are a separate deployment step unless this is set.
    /// </summary>
    public bool? MigrateOnStart { get; set; }

    public bool IsPostgres => Provider == "Postgres";
}
