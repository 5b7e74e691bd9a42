using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Data.Postgres;

/// <summary>The PostgreSQL store; owns the migrations under Data/Migrations/Postgres.</summary>
public sealed class PostgresLedgerlineDbContext(DbContextOptions<PostgresLedgerlineDbContext> options) : LedgerlineDbContext(options);
