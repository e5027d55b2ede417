using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace CommunityLead.Api.Data;

/// <summary>
/// Lets `dotnet ef migrations add … --context PostgresCommunityLeadDb` build the PostgreSQL model without a
/// server: adding a migration never connects, so the connection string is only a placeholder.
/// </summary>
public sealed class PostgresDesignTimeFactory : IDesignTimeDbContextFactory<PostgresCommunityLeadDb>
{
    public PostgresCommunityLeadDb CreateDbContext(string[] args) =>
        new(new DbContextOptionsBuilder<PostgresCommunityLeadDb>().UseNpgsql("Host=localhost;Database=communitylead").Options);
}
