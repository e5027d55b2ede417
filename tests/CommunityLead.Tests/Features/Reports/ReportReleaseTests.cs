using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using static CommunityLead.Tests.Features.Reports.ReportSeed;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>The protected set is decided once per version of the store's report inputs: never stale, never per request.</summary>
public class ReportReleaseTests
{
    private static IEnumerable<SeedKit> Many(string area, int count, DateTime? collected = null) =>
        Enumerable.Range(0, count).Select(_ => new SeedKit(area, Band.Low, 2, CollectedUtc: collected));

    private static long Version(CommunityLeadDb db) => db.ReportInputs.AsNoTracking().Single().Version;

    [Fact]
    public void ReportInputs_EveryWriteToATableAReportReads_RaisesTheVersion()
    {
        using var app = new CommunityLeadFactory();
        var before = app.WithDb(Version);
        Add(app, Many("harbour", 2));
        app.WithDb(db =>
        {
            Assert.True(Version(db) > before, "inserting households, kits, a batch and results");
            var kit = db.Kits.AsNoTracking().First();
            var interpretation = new KitInterpretation
            {
                KitId = kit.Id, KitCode = kit.Code, ProfileId = "seed", OutcomeJson = "{}", CreatedBy = "seed", CreatedAtUtc = kit.UpdatedAtUtc,
            };
            db.Interpretations.Add(interpretation);
            db.SaveChanges();
            db.Letters.Add(new IssuedLetter
            {
                KitId = kit.Id, KitCode = kit.Code, InterpretationId = interpretation.Id, ProfileId = "seed", ContentJson = "{}", Sha256 = "0",
                IssuedBy = "seed", IssuedAtUtc = kit.UpdatedAtUtc,
            });
            var beforeLetter = Version(db);
            db.SaveChanges();
            Assert.True(Version(db) > beforeLetter, "inserting a letter");
            // An update by hand, outside EF Core's change tracker, is seen all the same: the trigger is the database's.
            // The column names are the fixed list, never input.
            foreach (var (table, columns) in ReportInputColumns.ByTable)
                foreach (var column in columns)
                {
                    var v = Version(db);
                    var sql = $"""UPDATE "{table}" SET "{column}" = "{column}" WHERE "Id" IN (SELECT "Id" FROM "{table}" ORDER BY "Id" LIMIT 1)""";
                    db.Database.ExecuteSqlRaw(sql);
                    Assert.True(Version(db) > v, $"updating {table}.{column}");
                }
            // A change no report reads (a kit's state, bumped on every move) raises nothing: no decision is thrown away for it.
            var unchanged = Version(db);
            db.Kits.Where(k => k.Id == kit.Id).ExecuteUpdate(s => s.SetProperty(k => k.Version, k => k.Version + 1));
            Assert.Equal(unchanged, Version(db));
            var beforeDelete = Version(db);
            db.Letters.Where(l => l.KitId == kit.Id).ExecuteDelete();
            Assert.True(Version(db) > beforeDelete, "deleting a letter");
            if (TestStore.IsPostgres)
            {
                // TRUNCATE fires no row trigger on PostgreSQL; its own statement trigger raises the version.
                var beforeTruncate = Version(db);
                db.Database.ExecuteSqlRaw("""TRUNCATE "Letters" """);
                Assert.True(Version(db) > beforeTruncate, "truncating letters");
            }
            return 0;
        });
    }

    [Fact]
    public void ReportInputs_EveryColumnAReportQueryReads_IsWatched()
    {
        using var app = new CommunityLeadFactory();
        app.WithDb(db =>
        {
            foreach (var sql in new[] { ReportKits.KitRows(db).ToQueryString(), ReportKits.FirstDrawLead(db).ToQueryString(),
                         ReportKits.DaysToLetter(db).ToQueryString() })
            {
                // Both stores' SQL name a table once with its alias ("Kits" AS "k" or "Kits" AS k), then its columns by alias.
                var aliases = System.Text.RegularExpressions.Regex.Matches(sql, @"""(\w+)"" AS ""?(\w+)""?")
                    .ToDictionary(m => m.Groups[2].Value, m => m.Groups[1].Value);
                foreach (System.Text.RegularExpressions.Match m in System.Text.RegularExpressions.Regex.Matches(sql, @"""?(\w+)""?\.""(\w+)"""))
                {
                    var table = aliases[m.Groups[1].Value];
                    Assert.True(ReportInputColumns.ByTable.TryGetValue(table, out var watched) && watched.Contains(m.Groups[2].Value),
                        $"{table}.{m.Groups[2].Value} is read by a report but raises no version when it changes");
                }
            }
            return 0;
        });
    }

    [Fact]
    public async Task Summary_AskedAgainAfterAWrite_CountsTheNewKits()
    {
        using var app = new CommunityLeadFactory();
        Add(app, Many("harbour", 20));
        var health = app.CreateClient(Roles.Health);
        Assert.Equal(20, (await GetAsync(health, "/api/reports/summary"))["total"]!["kitsIssued"]!["value"]!.GetValue<int>());
        Assert.Equal(20, (await GetAsync(health, "/api/reports/summary"))["total"]!["kitsIssued"]!["value"]!.GetValue<int>());
        Add(app, Many("harbour", 5));
        Assert.Equal(25, (await GetAsync(health, "/api/reports/summary"))["total"]!["kitsIssued"]!["value"]!.GetValue<int>());
        // A change to a household (its area) moves its kit in the very next answer.
        app.WithDb(db => db.Households.Take(12).ExecuteUpdate(s => s.SetProperty(h => h.AreaCode, "old-mill")));
        var byArea = await GetAsync(health, "/api/reports/summary?groupBy=area");
        Assert.Equal(12, byArea["rows"]!.AsArray().Single(r => r!["group"]!.GetValue<string>() == "old-mill")!["kitsIssued"]!["value"]!.GetValue<int>());
    }

    [Theory]
    [InlineData("UTC", 0, 11)]
    [InlineData("America/Chicago", 11, 0)]
    public async Task Summary_MonthsFollowTheProgramsTimeZone(string zone, int october, int november)
    {
        // 2026-11-01 02:00 UTC is 31 October, 9 p.m. in Chicago (CDT, UTC−5, until 1 November): the program's own
        // calendar puts these samples in October (IANA tz database).
        using var app = new CommunityLeadFactory { Settings = { ["Program:TimeZone"] = zone } };
        Add(app, Many("harbour", 11, new DateTime(2026, 11, 1, 2, 0, 0, DateTimeKind.Utc)));
        var health = app.CreateClient(Roles.Health);
        async Task<int> Issued(string from, string to) =>
            (await GetAsync(health, $"/api/reports/summary?from={from}&to={to}"))["total"]!["kitsIssued"]!["value"]?.GetValue<int>() ?? 0;
        Assert.Equal(october, await Issued("2026-10-01", "2026-10-31"));
        Assert.Equal(november, await Issued("2026-11-01", "2026-11-30"));
    }

    [Fact]
    public async Task ReportRelease_AfterAWrite_DecidedInTheBackgroundBeforeAnyReportAsks()
    {
        using var app = new CommunityLeadFactory { Settings = { ["Reports:DecideInBackgroundEvery"] = "00:00:00.200" } };
        Add(app, Many("harbour", 12));
        var release = app.Services.GetRequiredService<ReportRelease>();
        var version = app.WithDb(Version);
        // Nothing has asked for a report: the set is decided for the version all the same, within a few looks.
        var waited = System.Diagnostics.Stopwatch.StartNew();
        while (release.DecidedVersion != version && waited.Elapsed < TimeSpan.FromSeconds(20)) await Task.Delay(50);
        Assert.Equal(version, release.DecidedVersion);
        Add(app, Many("harbour", 3));
        var later = app.WithDb(Version);
        waited.Restart();
        while (release.DecidedVersion != later && waited.Elapsed < TimeSpan.FromSeconds(20)) await Task.Delay(50);
        Assert.Equal(later, release.DecidedVersion);
    }
}
