using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class AttentionItemConfiguration : IEntityTypeConfiguration<AttentionItem>
{
    public void Configure(EntityTypeBuilder<AttentionItem> b)
    {
        b.Property(a => a.KitCode).HasMaxLength(16);
        b.Property(a => a.Detail).HasMaxLength(AttentionItem.DetailMaxLength);
        b.Property(a => a.ResolvedBy).HasMaxLength(100);
        b.Property(a => a.ResolutionNote).HasMaxLength(500);
        // Resolving saves only if nobody resolved it meanwhile, so one note (and one audit entry) wins.
        b.Property(a => a.ResolvedAtUtc).IsConcurrencyToken();
        b.HasIndex(a => new { a.ResolvedAtUtc, a.Priority, a.RaisedAtUtc });
        b.HasOne<Kit>().WithMany().HasForeignKey(a => a.KitId).OnDelete(DeleteBehavior.Restrict);
        b.HasOne(a => a.Interpretation).WithMany().HasForeignKey(a => a.InterpretationId).OnDelete(DeleteBehavior.Restrict);
    }
}
