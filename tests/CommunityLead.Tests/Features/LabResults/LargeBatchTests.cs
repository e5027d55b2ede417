using System.Diagnostics;
using System.Net;
using System.Text;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Infrastructure;
using Xunit.Abstractions;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>A full-size batch goes through the same checks and the same single transaction as a small one.</summary>
public class LargeBatchTests(ITestOutputHelper output)
{
    private const int KitCount = 5_000;

    [Fact]
    public async Task CsvBatch_TenThousandRows_AcceptedAndEveryKitAnalyzed()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        var codes = new HashSet<string>();
        while (codes.Count < KitCount) codes.Add(KitCode.NewCode());
        app.WithDb(db => SeedReceivedKits(db, codes));
        var csv = new StringBuilder("sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit,expected,measured\n");
        // Every first draw, then every flushed bottle: each kit's two rows are far apart, in different chunks of the
        // checks and of the store, as when a lab sorts its export by bottle.
        foreach (var (code, i) in codes.Select((c, i) => (c, i))) csv.Append($"sample,{code},first-draw,lead,{1 + i % 300 / 10.0:0.0},ug/L,0.3,1.0,,\n");
        foreach (var (code, i) in codes.Select((c, i) => (c, i))) csv.Append($"sample,{code},flushed,lead,{1 + i % 90 / 10.0:0.0},ug/L,0.3,1.0,,\n");
        // One calibration check per 10 samples [published: EPA Methods 200.7/200.8], and a blank.
        for (var i = 0; i < KitCount * 2 / 10; i++) csv.Append("calibration-check,,,lead,,ug/L,,,10,10.1\n");
        csv.Append("calibration-blank,,,lead,,ug/L,,,,0.02\n");

        var clock = Stopwatch.StartNew();
        var response = await PostCsvAsync(lab, Query("BIG-10K"), csv.ToString());
        clock.Stop();

        output.WriteLine($"POST of 10,000 rows ({csv.Length:N0} characters) took {clock.ElapsedMilliseconds:N0} ms");
        var outcome = await ReadAsync(response, HttpStatusCode.Created);
        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        Assert.Equal(10_000, outcome["resultCount"]!.GetValue<int>());
        var (results, moves, inEffect, checks, interpreted) = app.WithDb(db => (
            db.LabResults.Count(r => r.SupersededAtUtc == null),
            db.AuditTrail.Count(a => a.Subject == "kit" && a.Action == "record-results" && a.FromState == "received" && a.ToState == "analyzed"),
            db.Kits.Count(k => k.State == KitState.Analyzed || k.State == KitState.Interpreted),
            db.LabQc.Count(q => q.Type == CommunityLead.Rules.LabResults.QcType.CalibrationCheck),
            db.Interpretations.Select(i => i.KitId).Distinct().Count()));
        Assert.Equal((10_000, KitCount, KitCount, 1_000, KitCount), (results, moves, inEffect, checks, interpreted));
    }

    /// <summary>Water kits in the received state with a first draw and a flushed bottle, written straight to the database.</summary>
    private static int SeedReceivedKits(CommunityLeadDb db, IEnumerable<string> codes)
    {
        var now = DateTime.UtcNow;
        var household = new Household
        {
            Id = Guid.NewGuid(), Name = "Large Batch Home", ConsentVersion = "2026-01", AreaCode = "riverside",
            Address = new PostalAddress { Line1 = "1 Test Row", City = "Fennick Hollow", PostalCode = "00001" },
            ConsentGivenAt = new DateTimeOffset(2026, 3, 1, 10, 0, 0, TimeSpan.Zero), CreatedAtUtc = now, UpdatedAtUtc = now,
        };
        db.Households.Add(household);
        var collected = new DateTimeOffset(2026, 4, 3, 6, 0, 0, TimeSpan.Zero);
        foreach (var code in codes)
            db.Kits.Add(new Kit
            {
                Code = code, Kind = KitKind.Water, State = KitState.Received, HouseholdId = household.Id,
                IssuedAtUtc = now, UpdatedAtUtc = now, ReceivedAt = collected.AddDays(1),
                Collections =
                [
                    new Collection
                    {
                        RecordedAtUtc = now, RecordedBy = "test",
                        Samples =
                        [
                            new Sample
                            {
                                Index = 0, Bottle = BottleType.FirstDraw, VolumeMl = 1000, CollectedAt = collected,
                                CollectedAtUtc = collected.UtcDateTime, WaterLastUsedAt = collected.AddHours(-8), StandingMinutes = 480,
                            },
                            new Sample
                            {
                                Index = 1, Bottle = BottleType.Flushed, VolumeMl = 1000, CollectedAt = collected.AddMinutes(5),
                                CollectedAtUtc = collected.AddMinutes(5).UtcDateTime, FlushSeconds = 120,
                            },
                        ],
                    },
                ],
            });
        return db.SaveChanges();
    }
}
