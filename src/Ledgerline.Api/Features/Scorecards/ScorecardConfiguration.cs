using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Features.Scorecards;

internal sealed class ScorecardConfiguration : IEntityTypeConfiguration<Scorecard>
{
    public void Configure(EntityTypeBuilder<Scorecard> builder)
    {
        builder.HasIndex(s => s.Key).IsUnique();
        builder.Property(s => s.Key).HasMaxLength(64);
        builder.Property(s => s.Name).HasMaxLength(200);
        builder.Property(s => s.CreatedBy).HasMaxLength(200);
    }
}

internal sealed class ScorecardVersionConfiguration : IEntityTypeConfiguration<ScorecardVersion>
{
    public void Configure(EntityTypeBuilder<ScorecardVersion> builder)
    {
        builder.HasOne(v => v.Scorecard).WithMany(s => s.Versions).HasForeignKey(v => v.ScorecardId);
        builder.HasIndex(v => new { v.ScorecardId, v.Number }).IsUnique();
        // Two concurrent registrations of the same content meet here, whichever instance they hit.
        builder.HasIndex(v => new { v.ScorecardId, v.ContentHash }).IsUnique();
        builder.Property(v => v.ContentHash).HasMaxLength(64);
        builder.Property(v => v.RegisteredBy).HasMaxLength(200);
        builder.Property(v => v.ApprovedBy).HasMaxLength(200);
        builder.Property(v => v.RetiredBy).HasMaxLength(200);
        builder.HasOne(v => v.Baseline).WithOne().HasForeignKey<VersionBaseline>(b => b.VersionId);
    }
}

internal sealed class VersionBaselineConfiguration : IEntityTypeConfiguration<VersionBaseline>
{
    public void Configure(EntityTypeBuilder<VersionBaseline> builder)
    {
        builder.HasKey(b => b.VersionId);
        builder.Property(b => b.AttachedBy).HasMaxLength(200);
    }
}
