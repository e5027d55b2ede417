using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class CollectionConfiguration : IEntityTypeConfiguration<Collection>
{
    public void Configure(EntityTypeBuilder<Collection> b)
    {
        b.Property(c => c.RecordedBy).HasMaxLength(100);
        b.HasIndex(c => new { c.KitId, c.SupersededAtUtc });
        b.HasMany(c => c.Samples).WithOne().HasForeignKey(s => s.CollectionId).OnDelete(DeleteBehavior.Restrict);
        b.HasMany(c => c.Flags).WithOne().HasForeignKey(f => f.CollectionId).OnDelete(DeleteBehavior.Restrict);
    }
}
