using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class LabBatchConfiguration : IEntityTypeConfiguration<LabBatch>
{
    public void Configure(EntityTypeBuilder<LabBatch> b)
    {
        b.Property(x => x.BatchId).HasMaxLength(64);
        b.HasIndex(x => new { x.BatchId, x.Version }).IsUnique();
        b.HasIndex(x => x.Status);
        // Releasing saves only if the batch is still held: two coordinators releasing at once get one 200, one 409.
        b.Property(x => x.Status).IsConcurrencyToken();
        b.Property(x => x.CorrectionReason).HasMaxLength(500);
        b.Property(x => x.Method).HasMaxLength(100);
        b.Property(x => x.ContentHash).HasMaxLength(64);
        b.Property(x => x.Format).HasMaxLength(10);
        b.Property(x => x.PostedBy).HasMaxLength(100);
        b.Property(x => x.ReleasedBy).HasMaxLength(100);
        b.Property(x => x.ReleaseReason).HasMaxLength(500);
        b.Ignore(x => x.InEffect);
        b.HasMany(x => x.Results).WithOne(r => r.Batch).HasForeignKey(r => r.LabBatchId).OnDelete(DeleteBehavior.Restrict);
        b.HasMany(x => x.Qc).WithOne().HasForeignKey(q => q.LabBatchId).OnDelete(DeleteBehavior.Restrict);
    }
}
