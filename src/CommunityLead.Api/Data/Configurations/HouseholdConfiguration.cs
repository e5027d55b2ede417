using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class HouseholdConfiguration : IEntityTypeConfiguration<Household>
{
    public void Configure(EntityTypeBuilder<Household> b)
    {
        b.Property(h => h.Id).ValueGeneratedNever();
        b.Property(h => h.Name).HasMaxLength(200);
        b.ComplexProperty(h => h.Address, a =>
        {
            a.Property(x => x.Line1).HasMaxLength(200);
            a.Property(x => x.Line2).HasMaxLength(200);
            a.Property(x => x.City).HasMaxLength(100);
            a.Property(x => x.Region).HasMaxLength(100);
            a.Property(x => x.PostalCode).HasMaxLength(20);
        });
        b.Property(h => h.Phone).HasMaxLength(40);
        b.Property(h => h.Email).HasMaxLength(254);
        b.Property(h => h.ConsentVersion).HasMaxLength(50);
        b.Property(h => h.AreaCode).HasMaxLength(40);
        b.HasIndex(h => h.AreaCode);
        b.Property(h => h.Version).IsConcurrencyToken().HasDefaultValue(1);
        b.HasMany(h => h.Kits).WithOne(k => k.Household).HasForeignKey(k => k.HouseholdId).OnDelete(DeleteBehavior.Restrict);
    }
}
