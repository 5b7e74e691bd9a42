using Ledgerline.Api.Features.Scorecards;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Features.Reports;

internal sealed class MonitoringThresholdsConfiguration : IEntityTypeConfiguration<MonitoringThresholds>
{
    public void Configure(EntityTypeBuilder<MonitoringThresholds> builder)
    {
        // The table keeps the name it was created with, before alerts and reports were separate features.
        builder.ToTable("AlertThresholds");
        builder.HasKey(t => t.ScorecardId);
        builder.HasOne<Scorecard>().WithOne().HasForeignKey<MonitoringThresholds>(t => t.ScorecardId);
        builder.Property(t => t.UpdatedBy).HasMaxLength(200);
    }
}
