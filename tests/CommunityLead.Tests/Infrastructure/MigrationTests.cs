using CommunityLead.Api.Data;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>Each provider has its own migrations; a model change with a migration for only one must fail here.</summary>
public class MigrationTests
{
    [Fact]
    public void Sqlite_Model_HasAMigrationForEveryChange()
    {
        using var db = new CommunityLeadDb(new DbContextOptionsBuilder<CommunityLeadDb>().UseSqlite("Data Source=:memory:").Options);
        Assert.False(db.Database.HasPendingModelChanges(), "Add a SQLite migration (DEVELOPERS.md, Add a migration).");
    }

    [Fact]
    public void Postgres_Model_HasAMigrationForEveryChange()
    {
        using var db = new PostgresDesignTimeFactory().CreateDbContext([]);
        Assert.False(db.Database.HasPendingModelChanges(), "Add a PostgreSQL migration (DEVELOPERS.md, Add a migration).");
    }
}
