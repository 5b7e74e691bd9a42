using Ledgerline.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Ledger;

internal sealed class OutcomeConfiguration : IEntityTypeConfiguration<OutcomeObservation>
{
    public void Configure(EntityTypeBuilder<OutcomeObservation> builder)
    {
        builder.HasOne<Decision>().WithMany().HasForeignKey(o => o.DecisionId);
        builder.HasIndex(o => new { o.DecisionId, o.ObservedAt });
        builder.Property(o => o.Status).HasConversion(new PerformanceWordConverter()).HasMaxLength(16);
    }
}
