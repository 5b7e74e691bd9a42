using Ledgerline.Api.Data.Audit;
using Ledgerline.Api.Features.Access;
using Ledgerline.Api.Features.Alerts;
using Ledgerline.Api.Features.Reports;
using Ledgerline.Api.Features.Scorecards;
using Ledgerline.Api.Features.Traffic;
using Ledgerline.Api.Ledger;
using Ledgerline.Scoring.Scorecards;
using Microsoft.EntityFrameworkCore;

namespace Ledgerline.Api.Data;

/// <summary>
/// The model shared by every provider. Each provider has a thin subclass that owns its own
/// migration set (SQLite and PostgreSQL differ in types and SQL), so the model is written once.
/// </summary>
public abstract class LedgerlineDbContext(DbContextOptions options) : DbContext(options)
{
    public DbSet<Scorecard> Scorecards => Set<Scorecard>();

    public DbSet<ScorecardVersion> Versions => Set<ScorecardVersion>();

    public DbSet<VersionBaseline> Baselines => Set<VersionBaseline>();

    public DbSet<TrafficPlanRevision> TrafficPlans => Set<TrafficPlanRevision>();

    public DbSet<Decision> Decisions => Set<Decision>();

    public DbSet<DecisionScore> DecisionScores => Set<DecisionScore>();

    public DbSet<OutcomeObservation> Outcomes => Set<OutcomeObservation>();

    public DbSet<ApiKey> ApiKeys => Set<ApiKey>();

    public DbSet<AuditEntry> AuditEntries => Set<AuditEntry>();

    public DbSet<Alert> Alerts => Set<Alert>();

    public DbSet<MonitoringThresholds> MonitoringThresholds => Set<MonitoringThresholds>();

    public DbSet<AlertDelivery> AlertDeliveries => Set<AlertDelivery>();

    protected override void OnModelCreating(ModelBuilder modelBuilder)
    {
        modelBuilder.ApplyConfiguration(new ScorecardConfiguration());
        modelBuilder.ApplyConfiguration(new ScorecardVersionConfiguration());
        modelBuilder.ApplyConfiguration(new VersionBaselineConfiguration());
        modelBuilder.ApplyConfiguration(new TrafficConfiguration());
        modelBuilder.ApplyConfiguration(new DecisionConfiguration());
        modelBuilder.ApplyConfiguration(new DecisionScoreConfiguration());
        modelBuilder.ApplyConfiguration(new OutcomeConfiguration());
        modelBuilder.ApplyConfiguration(new ApiKeyConfiguration());
        modelBuilder.ApplyConfiguration(new AuditEntryConfiguration());
        modelBuilder.ApplyConfiguration(new AlertConfiguration());
        modelBuilder.ApplyConfiguration(new MonitoringThresholdsConfiguration());
        modelBuilder.ApplyConfiguration(new AlertDeliveryConfiguration());
    }

    // A change that carries audit entries is saved with them linked onto the audit chain.
    public override int SaveChanges(bool acceptAllChangesOnSuccess) =>
        AuditChain.HasPending(this) ? AuditChain.Save(this, () => base.SaveChanges(acceptAllChangesOnSuccess)) : base.SaveChanges(acceptAllChangesOnSuccess);

    public override Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default) =>
        AuditChain.HasPending(this)
            ? AuditChain.SaveAsync(this, () => base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken), cancellationToken)
            : base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken);

    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        // Enums are stored as their names: readable in SQL, and safe against reordering.
        configurationBuilder.Properties<Enum>().HaveConversion<string>().HaveMaxLength(32);
        configurationBuilder.Properties<Band>().HaveConversion<BandWordConverter>().HaveMaxLength(16);
    }
}
