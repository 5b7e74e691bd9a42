using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Data.Sqlite;

/// <summary>The SQLite store (embedded default); owns the migrations under Data/Migrations/Sqlite.</summary>
public sealed class SqliteLedgerlineDbContext(DbContextOptions<SqliteLedgerlineDbContext> options) : LedgerlineDbContext(options);
