using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Interpretation;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class KitInterpretationConfiguration : IEntityTypeConfiguration<KitInterpretation>
{
    public void Configure(EntityTypeBuilder<KitInterpretation> b)
    {
        b.Property(i => i.KitCode).HasMaxLength(16);
        b.Property(i => i.ProfileId).HasMaxLength(ProfileReader.IdMaxLength);
        b.Property(i => i.CreatedBy).HasMaxLength(100);
        b.HasIndex(i => new { i.KitId, i.SupersededAtUtc });
        b.HasOne<Kit>().WithMany().HasForeignKey(i => i.KitId).OnDelete(DeleteBehavior.Restrict);
    }
}
