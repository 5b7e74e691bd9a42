using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace Ledgerline.Api.Data;

/// <summary>Healthy once the database answers and no migration is pending, so a load balancer sends no traffic to an instance that cannot serve.</summary>
internal sealed class DatabaseHealthCheck(LedgerlineDbContext db) : IHealthCheck
{
    public async Task<HealthCheckResult> CheckHealthAsync(HealthCheckContext context, CancellationToken cancellationToken = default)
    {
        try
        {
            if (!await db.Database.CanConnectAsync(cancellationToken))
            {
                return HealthCheckResult.Unhealthy("The database cannot be reached.");
            }

            var pending = (await db.Database.GetPendingMigrationsAsync(cancellationToken)).Count();
            return pending == 0
                ? HealthCheckResult.Healthy()
                : HealthCheckResult.Unhealthy($"{pending} database migration(s) are not applied yet.");
        }
        catch (Exception e) when (e is InvalidOperationException or System.Data.Common.DbException)
        {
            return HealthCheckResult.Unhealthy("The database cannot be reached.");
        }
    }
}
