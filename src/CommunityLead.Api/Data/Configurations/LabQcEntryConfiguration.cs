using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class LabQcEntryConfiguration : IEntityTypeConfiguration<LabQcEntry>
{
    public void Configure(EntityTypeBuilder<LabQcEntry> b) => b.Property(q => q.Unit).HasMaxLength(10);
}
