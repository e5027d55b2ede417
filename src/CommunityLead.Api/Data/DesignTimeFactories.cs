using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace CommunityLead.Api.Data;

/// <summary>
/// Lets `dotnet ef migrations add … --context PostgresCommunityLeadDb` build the PostgreSQL model without a
/// server: adding a migration never connects, so the connection string is only a placeholder.
/// </summary>
/// <remarks>
/// The SQLite context needs a factory of its own (<see cref="SqliteDesignTimeFactory"/>): without one the tools
/// would serve `--context CommunityLeadDb` from this factory, whose context derives from it.
/// </remarks>
public sealed class PostgresDesignTimeFactory : IDesignTimeDbContextFactory<PostgresCommunityLeadDb>
{
    public PostgresCommunityLeadDb CreateDbContext(string[] args) =>
        new(new DbContextOptionsBuilder<PostgresCommunityLeadDb>().UseNpgsql("Host=localhost;Database=communitylead").Options);
}

/// <summary>`dotnet ef … --context CommunityLeadDb`: the SQLite model, independent of the app's settings.</summary>
public sealed class SqliteDesignTimeFactory : IDesignTimeDbContextFactory<CommunityLeadDb>
{
    public CommunityLeadDb CreateDbContext(string[] args) =>
        new(new DbContextOptionsBuilder<CommunityLeadDb>().UseSqlite("Data Source=design-time.db").Options);
}
