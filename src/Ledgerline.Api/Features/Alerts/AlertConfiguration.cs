using Ledgerline.Api.Features.Scorecards;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Features.Alerts;

internal sealed class AlertConfiguration : IEntityTypeConfiguration<Alert>
{
    public void Configure(EntityTypeBuilder<Alert> builder)
    {
        builder.HasOne<Scorecard>().WithMany().HasForeignKey(a => a.ScorecardId);
        // Raised once across every instance: one open alert per identity. The filter is plain SQL
        // both SQLite and PostgreSQL accept.
        builder.HasIndex(a => new { a.ScorecardId, a.Kind, a.Version, a.Subject }).IsUnique().HasFilter("\"ClosedAt\" IS NULL");
        builder.HasIndex(a => new { a.ScorecardId, a.ClosedAt });
        builder.Property(a => a.Kind).HasMaxLength(32);
        builder.Property(a => a.Subject).HasMaxLength(200);
        builder.Property(a => a.Period).HasMaxLength(100);
        builder.Property(a => a.Severity).HasMaxLength(16);
        builder.Property(a => a.Evidence).HasMaxLength(2000);
    }
}

internal sealed class AlertDeliveryConfiguration : IEntityTypeConfiguration<AlertDelivery>
{
    public void Configure(EntityTypeBuilder<AlertDelivery> builder)
    {
        builder.HasOne<Alert>().WithMany().HasForeignKey(d => d.AlertId);
        builder.HasIndex(d => new { d.DeliveredAt, d.NextAttemptAt });
        builder.Property(d => d.LastError).HasMaxLength(1000);
    }
}
