using CommunityLead.Rules.Sampling;
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

public class LabViewMigrationTests
{
    [SqliteFact]
    public void LabViewAndAreas_OnADatabaseWithFreeTextTapsAndAreaCodes_MapsKnownTapsNotesTheRestAndListsTheAreas()
    {
        var folder = Directory.CreateTempSubdirectory("cl-upgrade").FullName;
        try
        {
            var options = new DbContextOptionsBuilder<CommunityLeadDb>().UseSqlite($"Data Source={Path.Combine(folder, "old.db")}").Options;
            using (var db = new CommunityLeadDb(options))
            {
                db.GetService<IMigrator>().Migrate("AttentionItemInterpretation");
                db.Database.OpenConnection();
                db.Database.ExecuteSqlRaw("PRAGMA foreign_keys = OFF");
                foreach (var (id, area) in new[] { ("a1", "harbour"), ("a2", "harbour"), ("a3", "old-mill") })
                    db.Database.ExecuteSql($"""
                        INSERT INTO "Households" ("Id", "Name", "Address_Line1", "Address_City", "Address_PostalCode", "Language", "ConsentVersion",
                            "ConsentGivenAt", "AreaCode", "WaterSource", "ServiceLine", "ChildUnder6", "Pregnant", "FilterInUse", "CreatedAtUtc", "UpdatedAtUtc")
                        VALUES ({id}, 'N', 'L', 'C', 'P', 'En', 'v', '2026-03-01T00:00:00+00:00', {area}, 'Public', 'Unknown', 0, 0, 0,
                            '2026-03-01 00:00:00', '2026-03-01 00:00:00')
                        """);
                var taps = new[] { "Kitchen", " bathroom sink ", "Ottilie's bar, 555 0166", "", null };
                for (var i = 0; i < taps.Length; i++)
                    db.Database.ExecuteSql($"""
                        INSERT INTO "Samples" ("CollectionId", "Index", "Bottle", "CollectedAt", "CollectedAtUtc", "Tap")
                        VALUES (1, {i}, 'FirstDraw', '2026-04-03T06:00:00+00:00', '2026-04-03 06:00:00', {taps[i]})
                        """);
                db.Database.CloseConnection();
            }
            using (var db = new CommunityLeadDb(options))
            {
                db.Database.Migrate();
                var samples = db.Samples.OrderBy(s => s.Index).Select(s => new { s.Tap, s.TapNote }).ToList();
                Assert.Equal(
                    [(SampleTap.Kitchen, null), (SampleTap.Bathroom, null), (SampleTap.Other, "Ottilie's bar, 555 0166"), (null, null), (null, null)],
                    samples.Select(s => (s.Tap, s.TapNote)));
                Assert.Equal([("harbour", true), ("old-mill", true)], db.Areas.OrderBy(a => a.Code).Select(a => new { a.Code, a.Active }).ToList()
                    .Select(a => (a.Code, a.Active)));
            }
        }
        finally
        {
            Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
            Directory.Delete(folder, recursive: true);
        }
    }
}
