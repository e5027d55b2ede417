using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class ApiKeyConfiguration : IEntityTypeConfiguration<ApiKey>
{
    public void Configure(EntityTypeBuilder<ApiKey> b)
    {
        b.Property(k => k.Label).HasMaxLength(100);
        b.HasIndex(k => k.Label).IsUnique();
        b.Property(k => k.Role).HasMaxLength(20);
        b.Property(k => k.KeyId).HasMaxLength(32);
        b.HasIndex(k => k.KeyId).IsUnique();
    }
}
