using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class AreaConfiguration : IEntityTypeConfiguration<Area>
{
    public void Configure(EntityTypeBuilder<Area> b)
    {
        b.HasKey(a => a.Code);
        b.Property(a => a.Code).HasMaxLength(40);
        b.Property(a => a.Name).HasMaxLength(100);
    }
}
