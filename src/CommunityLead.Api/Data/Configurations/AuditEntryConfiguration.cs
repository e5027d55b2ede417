using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class AuditEntryConfiguration : IEntityTypeConfiguration<AuditEntry>
{
    public void Configure(EntityTypeBuilder<AuditEntry> b)
    {
        b.ToTable("AuditTrail");
        b.Property(a => a.ActorLabel).HasMaxLength(100);
        b.Property(a => a.ActorRole).HasMaxLength(20);
        b.Property(a => a.Subject).HasMaxLength(20);
        b.Property(a => a.SubjectKey).HasMaxLength(64);
        b.Property(a => a.Action).HasMaxLength(40);
        b.Property(a => a.FromState).HasMaxLength(20);
        b.Property(a => a.ToState).HasMaxLength(20);
        b.Property(a => a.Reason).HasMaxLength(500);
        b.Property(a => a.Detail).HasMaxLength(1000);
        b.HasIndex(a => new { a.Subject, a.SubjectKey });
    }
}
