using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Data.Audit;

internal sealed class AuditEntryConfiguration : IEntityTypeConfiguration<AuditEntry>
{
    public void Configure(EntityTypeBuilder<AuditEntry> builder)
    {
        builder.HasIndex(e => e.Sequence).IsUnique();
        builder.HasIndex(e => e.At);
        builder.HasIndex(e => e.Actor);
        builder.HasIndex(e => e.Subject);
        builder.Property(e => e.Actor).HasMaxLength(200);
        builder.Property(e => e.Action).HasMaxLength(100);
        builder.Property(e => e.Subject).HasMaxLength(300);
        builder.Property(e => e.ContentHash).HasMaxLength(64);
        builder.Property(e => e.PreviousHash).HasMaxLength(64);
        builder.Property(e => e.EntryHash).HasMaxLength(64);
    }
}
