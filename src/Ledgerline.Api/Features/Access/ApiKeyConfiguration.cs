using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace Ledgerline.Api.Features.Access;

internal sealed class ApiKeyConfiguration : IEntityTypeConfiguration<ApiKey>
{
    public void Configure(EntityTypeBuilder<ApiKey> builder)
    {
        builder.HasIndex(k => k.SecretHash).IsUnique();
        builder.Property(k => k.SecretHash).HasMaxLength(64);
        builder.Property(k => k.Name).HasMaxLength(200);
        builder.Property(k => k.Roles).HasMaxLength(200);
        builder.Property(k => k.CreatedBy).HasMaxLength(200);
    }
}
