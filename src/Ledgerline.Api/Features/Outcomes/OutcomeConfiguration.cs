using Ledgerline.Api.Features.Decisions;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Features.Outcomes;

internal sealed class OutcomeConfiguration : IEntityTypeConfiguration<OutcomeObservation>
{
    public void Configure(EntityTypeBuilder<OutcomeObservation> builder)
    {
        builder.HasOne<Decision>().WithMany().HasForeignKey(o => o.DecisionId);
        builder.HasIndex(o => new { o.DecisionId, o.ObservedAt });
        builder.Property(o => o.Status).HasMaxLength(16);
    }
}
