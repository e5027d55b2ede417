using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class LabResultConfiguration : IEntityTypeConfiguration<LabResult>
{
    public void Configure(EntityTypeBuilder<LabResult> b)
    {
        b.Property(r => r.KitCode).HasMaxLength(16);
        b.Property(r => r.Unit).HasMaxLength(10);
        b.Property(r => r.OriginalUnit).HasMaxLength(10);
        b.Property(r => r.Qualifier).HasMaxLength(2);
        b.Property(r => r.ReplicatesJson).HasMaxLength(2000);
        b.Property(r => r.HoldingFlags).HasMaxLength(1000);
        b.HasIndex(r => new { r.KitId, r.SupersededAtUtc });
        b.HasOne<Kit>().WithMany().HasForeignKey(r => r.KitId).OnDelete(DeleteBehavior.Restrict);
    }
}
