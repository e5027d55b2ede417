using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>A decision's rows read by hand must be exactly the rows EF Core reads from the same queries.</summary>
public class ReportKitReadingTests
{
    [Fact]
    public async Task KitsAndLead_ReadByHand_EveryRowAsEfCoreReadsIt()
    {
        using var app = new CommunityLeadFactory();
        ReportStore.Seed(app);
        app.WithDb(db =>
        {
            // What the seed leaves out: a kit not yet collected or received, a copper band, no year built, instants with
            // fractions of a second (one a tick before a calendar day ends), several lead values for one kit.
            var kits = db.Kits.Include(k => k.Household).OrderBy(k => k.Id).Take(3).ToList();
            (kits[0].CollectedAtUtc, kits[0].ReceivedAt) = (null, null);
            kits[0].IssuedAtUtc = new DateTime(2026, 10, 31, 23, 59, 59, DateTimeKind.Utc).AddTicks(9_999_990); // PostgreSQL keeps microseconds
            (kits[1].CollectedAtUtc, kits[1].CopperBand) = (new DateTime(2026, 3, 8, 7, 0, 0, 500, DateTimeKind.Utc), Band.Advisory);
            kits[1].Household!.YearBuilt = null;
            kits[2].CollectedAtUtc = new DateTime(2026, 1, 2, 3, 4, 5, DateTimeKind.Utc).AddTicks(1);
            var result = db.LabResults.AsNoTracking().First(r => r.KitId == kits[2].Id);
            result.Id = 0;
            result.Value = 15.000000000000002; // a value text would round: it is read as a number
            result.Qualifier = "<";
            db.LabResults.Add(result);
            return db.SaveChanges();
        });

        using var scope = app.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        var viaEf = await ReportKits.KitRows(db).ToListAsync();
        var byHand = new List<ReportKits.KitRow>();
        await foreach (var k in ReportKitReading.KitsAsync(db, CancellationToken.None)) byHand.Add(k);
        Assert.True(viaEf.Count > 300, "the whole seeded store");
        Assert.Equal(viaEf.OrderBy(k => k.Id), byHand.OrderBy(k => k.Id));
        // Record equality compares a DateTime's ticks only; the program's calendar needs it to be UTC.
        Assert.All(byHand, k => Assert.Equal(DateTimeKind.Utc, k.DatedUtc.Kind));
        Assert.Contains(byHand, k => k.DatedUtc.Ticks % TimeSpan.TicksPerSecond == 9_999_990 && !k.Returned);
        Assert.Contains(byHand, k => k.CopperBand == Band.Advisory && k.YearBuilt is null);

        var leadViaEf = await ReportKits.FirstDrawLead(db).ToListAsync();
        var leadByHand = new List<ReportKits.LeadRow>();
        await foreach (var r in ReportKitReading.FirstDrawLeadAsync(db, CancellationToken.None)) leadByHand.Add(r);
        Assert.Equal(leadViaEf.OrderBy(r => r.KitId).ThenBy(r => r.Value), leadByHand.OrderBy(r => r.KitId).ThenBy(r => r.Value));
        Assert.Contains(leadByHand, r => r is { Value: 15.000000000000002, Below: true });
    }

    [Theory]
    // DateTime.Parse with the invariant culture is how the provider reads a stored date (general-purpose reference).
    [InlineData("2026-10-31 23:59:59.9999999")]
    [InlineData("2026-03-08 07:00:00.5")]
    [InlineData("2026-01-02 03:04:05")]
    [InlineData("2024-02-29 12:00:00.0000001")]
    [InlineData("2026-01-02T03:04:05")]
    [InlineData("2026-01-02 03:04:05Z")]
    public void StoredDate_SameInstantAsDateTimeParse(string text)
    {
        var expected = DateTime.Parse(text, System.Globalization.CultureInfo.InvariantCulture);
        var read = StoredDate.Utc(text);
        Assert.Equal(expected.Ticks, read.Ticks);
        Assert.Equal(DateTimeKind.Utc, read.Kind);
    }
}
