using CommunityLead.Api.Data;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Infrastructure;
using Microsoft.EntityFrameworkCore.Migrations;

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

/// <summary>Upgrading a database that already holds what a new constraint forbids.</summary>
public class MigrationUpgradeTests
{
    [SqliteFact]
    public void ConcurrencyGuards_OnADatabaseWithDuplicateLetters_KeepsTheSentOneAndBuildsTheIndex()
    {
        var folder = Directory.CreateTempSubdirectory("cl-upgrade").FullName;
        try
        {
            var options = new DbContextOptionsBuilder<CommunityLeadDb>().UseSqlite($"Data Source={Path.Combine(folder, "old.db")}").Options;
            using (var db = new CommunityLeadDb(options))
            {
                db.GetService<IMigrator>().Migrate("ReportPeriod");
                // Two records of one letter, as a render race could leave them; only the second was confirmed sent.
                // Foreign keys are off for this connection only, so no kit or interpretation is needed.
                db.Database.OpenConnection();
                db.Database.ExecuteSqlRaw("PRAGMA foreign_keys = OFF");
                foreach (var sent in new string?[] { null, "2026-04-12 10:00:00" })
                    db.Database.ExecuteSql($"""
                        INSERT INTO "Letters" ("KitId", "KitCode", "InterpretationId", "ProfileId", "ProfileVersion", "Language", "Kind",
                            "ContentJson", "Sha256", "Pages", "IssuedAtUtc", "IssuedBy", "CollectedOn", "SentAtUtc")
                        VALUES (1, 'K', 1, 'us-lcri', 1, 'En', 'Results', '[]', 'abc', 1, '2026-04-10 10:00:00', 'x', '2026-04-03', {sent})
                        """);
                db.Database.CloseConnection();
            }
            using (var db = new CommunityLeadDb(options))
            {
                db.Database.Migrate();
                var letter = Assert.Single(db.Letters.ToList());
                Assert.NotNull(letter.SentAtUtc);
            }
        }
        finally
        {
            Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
            Directory.Delete(folder, recursive: true);
        }
    }

    [SqliteFact]
    public void AttentionItemInterpretation_OnADatabaseWithItems_RanksImplausibleAfterUrgentAndLinksItemsToTheirInterpretation()
    {
        var folder = Directory.CreateTempSubdirectory("cl-upgrade").FullName;
        try
        {
            var options = new DbContextOptionsBuilder<CommunityLeadDb>().UseSqlite($"Data Source={Path.Combine(folder, "old.db")}").Options;
            using (var db = new CommunityLeadDb(options))
            {
                db.GetService<IMigrator>().Migrate("LetterReleaseAndCatalog");
                db.Database.OpenConnection();
                db.Database.ExecuteSqlRaw("PRAGMA foreign_keys = OFF");
                // Kit 1 interpreted twice; its urgent item came with the second interpretation (same time), as did the
                // action-level one. A lab correction's item has no interpretation behind it.
                foreach (var (id, at) in new[] { (1, "2026-04-05 10:00:00"), (2, "2026-04-06 09:30:00") })
                    db.Database.ExecuteSql($"""
                        INSERT INTO "Interpretations" ("Id", "KitId", "KitCode", "Band", "ProfileId", "ProfileVersion", "OutcomeJson",
                            "CreatedAtUtc", "CreatedBy")
                        VALUES ({id}, 1, 'K', 'Urgent', 'us-lcri', 1, '[]', {at}, 'lab')
                        """);
                foreach (var (reason, priority, at) in new[]
                {
                    ("Urgent", 0, "2026-04-06 09:30:00"), ("ActionLevel", 2, "2026-04-06 09:30:00"),
                    ("CorrectedAfterLetter", 5, "2026-04-06 09:30:00"),
                })
                    db.Database.ExecuteSql($"""
                        INSERT INTO "Attention" ("KitId", "KitCode", "Reason", "Priority", "Detail", "RaisedAtUtc")
                        VALUES (1, 'K', {reason}, {priority}, 'detail', {at})
                        """);
                db.Database.CloseConnection();
            }
            using (var db = new CommunityLeadDb(options))
            {
                db.Database.Migrate();
                var items = db.Attention.OrderBy(a => a.Id).Select(a => new { a.Priority, a.InterpretationId }).ToList();
                Assert.Equal([(0, (int?)2), (3, 2), (6, null)], items.Select(a => (a.Priority, a.InterpretationId)));
            }
        }
        finally
        {
            Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
            Directory.Delete(folder, recursive: true);
        }
    }
}
