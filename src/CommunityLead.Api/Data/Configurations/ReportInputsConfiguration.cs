using CommunityLead.Api.Data.Entities;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace CommunityLead.Api.Data.Configurations;

public class ReportInputsConfiguration : IEntityTypeConfiguration<ReportInputs>
{
    public void Configure(EntityTypeBuilder<ReportInputs> b)
    {
        b.Property(r => r.Id).ValueGeneratedNever();
        // The row exists from the migration on: the triggers only ever update it.
        b.HasData(new ReportInputs { Id = ReportInputs.SingleRow, Version = 0 });
    }
}
