using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Interpretation;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class IssuedLetterConfiguration : IEntityTypeConfiguration<IssuedLetter>
{
    public void Configure(EntityTypeBuilder<IssuedLetter> b)
    {
        b.Property(l => l.KitCode).HasMaxLength(16);
        b.Property(l => l.ProfileId).HasMaxLength(ProfileReader.IdMaxLength);
        b.Property(l => l.Sha256).HasMaxLength(64);
        b.Property(l => l.IssuedBy).HasMaxLength(100);
        b.Property(l => l.SentBy).HasMaxLength(100);
        b.Property(l => l.CatalogVersion).HasMaxLength(20);
        b.Property(l => l.ReleasedBy).HasMaxLength(100);
        b.HasIndex(l => new { l.KitId, l.IssuedAtUtc });
        b.HasIndex(l => l.SentAtUtc);
        // One record per distinct letter: two requests rendering it at once must not both record it.
        b.HasIndex(l => new { l.KitId, l.InterpretationId, l.Sha256 }).IsUnique();
        b.HasOne<Kit>().WithMany().HasForeignKey(l => l.KitId).OnDelete(DeleteBehavior.Restrict);
        b.HasOne<KitInterpretation>().WithMany().HasForeignKey(l => l.InterpretationId).OnDelete(DeleteBehavior.Restrict);
    }
}
