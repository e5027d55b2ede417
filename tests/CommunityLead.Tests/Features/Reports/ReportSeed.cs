using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Infrastructure;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>Puts interpreted kits straight into the database: reports only read, so the walk through the API is not needed.</summary>
public static class ReportSeed
{
    public sealed record SeedKit(string Area, Band LeadBand, double FirstDrawLead, bool Below = false, int? YearBuilt = 1960,
        WaterSource Source = WaterSource.Public, bool Child = false, DateTime? CollectedUtc = null, KitKind Kind = KitKind.Water,
        ServiceLineMaterial ServiceLine = ServiceLineMaterial.Unknown);

    public static void Add(CommunityLeadFactory app, IEnumerable<SeedKit> kits)
    {
        app.WithDb(db =>
        {
            var now = new DateTime(2026, 4, 10, 0, 0, 0, DateTimeKind.Utc);
            var batch = new LabBatch
            {
                BatchId = $"SEED-{Guid.NewGuid():N}"[..20], Version = 1, Method = "EPA 200.8", AnalyzedAt = now, AnalyzedAtUtc = now,
                ContentHash = Guid.NewGuid().ToString("N"), Format = "json", Status = BatchStatus.Accepted, QcJson = "{}",
                PostedBy = "seed", PostedAtUtc = now,
            };
            db.LabBatches.Add(batch);
            var added = new List<(Kit Kit, SeedKit Seed, DateTime Collected)>();
            foreach (var s in kits)
            {
                var household = new Household
                {
                    Id = Guid.NewGuid(), Name = "Seeded Home", ConsentVersion = "v1", AreaCode = s.Area, WaterSource = s.Source,
                    YearBuilt = s.YearBuilt, ChildUnder6 = s.Child, ConsentGivenAt = now, ServiceLine = s.ServiceLine,
                    Address = new PostalAddress { Line1 = "1 Seed Row", City = "Brindle Cove", PostalCode = "00001" },
                    CreatedAtUtc = now, UpdatedAtUtc = now,
                };
                var collected = s.CollectedUtc ?? new DateTime(2026, 4, 3, 6, 0, 0, DateTimeKind.Utc);
                var kit = new Kit
                {
                    Code = KitCode.NewCode(), Kind = s.Kind, State = KitState.Interpreted, Household = household,
                    IssuedAtUtc = collected.AddDays(-3), UpdatedAtUtc = now, ReceivedAt = collected.AddDays(1),
                    CollectedAtUtc = collected, Band = s.LeadBand, LeadBand = s.LeadBand,
                };
                db.Kits.Add(kit);
                added.Add((kit, s, collected));
            }
            db.SaveChanges();
            // Soil kits have no first draw: their results stay out of the water statistics.
            foreach (var (kit, s, collected) in added.Where(a => a.Seed.Kind != KitKind.Soil))
                batch.Results.Add(new LabResult
                {
                    KitId = kit.Id, KitCode = kit.Code, Bottle = BottleType.FirstDraw, Analyte = Analyte.Lead, Value = s.FirstDrawLead, Unit = "µg/L",
                    OriginalValue = s.FirstDrawLead, OriginalUnit = "ug/L", Qualifier = s.Below ? "<" : null, Mdl = 0.3, ReportingLimit = 1,
                    CollectedAt = collected,
                });
            return db.SaveChanges();
        });
    }
}
