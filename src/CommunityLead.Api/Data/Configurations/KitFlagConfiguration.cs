using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class KitFlagConfiguration : IEntityTypeConfiguration<KitFlag>
{
    public void Configure(EntityTypeBuilder<KitFlag> b) => b.Property(f => f.Message).HasMaxLength(300);
}
