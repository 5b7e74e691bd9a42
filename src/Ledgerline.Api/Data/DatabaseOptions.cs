using System.ComponentModel.DataAnnotations;
using Ledgerline.Api.Data.Sqlite;

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

    /// <summary>
    /// SQLite: how long the write-ahead log may grow, in 4 KB frames, before it is made to start
    /// over (see <see cref="SqliteLogRestart"/>): the disk it may take against how often the decision
    /// log pauses for the restart.
    /// </summary>
    [Range(64, int.MaxValue)]
    public int SqliteLogRestartFrames { get; set; } = 65536;

    public bool IsPostgres => Provider == "Postgres";
}
