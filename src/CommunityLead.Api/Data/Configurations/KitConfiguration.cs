using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class KitConfiguration : IEntityTypeConfiguration<Kit>
{
    public void Configure(EntityTypeBuilder<Kit> b)
    {
        b.Property(k => k.Code).HasMaxLength(16);
        b.HasIndex(k => k.Code).IsUnique();
        b.HasIndex(k => new { k.State, k.UpdatedAtUtc });
        b.HasIndex(k => k.CollectedAtUtc);
        b.HasIndex(k => k.PeriodMonth);
        b.Property(k => k.StateReason).HasMaxLength(500);
        b.Property(k => k.ReplacesCode).HasMaxLength(16);
        b.Property(k => k.ReplacedByCode).HasMaxLength(16);
        b.Property(k => k.ResultSecretHash).HasMaxLength(64);
        b.Property(k => k.Version).IsConcurrencyToken();
        b.HasMany(k => k.Collections).WithOne().HasForeignKey(c => c.KitId).OnDelete(DeleteBehavior.Restrict);
    }
}
