using Ledgerline.Api.Features.Scorecards;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Features.Traffic;

internal sealed class TrafficConfiguration : IEntityTypeConfiguration<TrafficPlanRevision>
{
    public void Configure(EntityTypeBuilder<TrafficPlanRevision> builder)
    {
        builder.HasOne<Scorecard>().WithMany().HasForeignKey(p => p.ScorecardId);
        // Concurrent plan changes from two instances cannot both become revision n.
        builder.HasIndex(p => new { p.ScorecardId, p.Revision }).IsUnique();
        builder.Property(p => p.Salt).HasMaxLength(64);
        builder.Property(p => p.Reason).HasMaxLength(1000);
        builder.Property(p => p.ChangedBy).HasMaxLength(200);
    }
}
