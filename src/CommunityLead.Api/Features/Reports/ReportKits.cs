using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Reports;

/// <summary>Soil and water kits are never counted together: each kind has its own protected table.</summary>
public enum ReportKitKind { Water, Soil }

/// <summary>One kit reduced to what a report may count, never its household's identity.</summary>
public sealed record ReportKit(
    ReportKitKind Kind, int PeriodMonth, string Area, WaterSource Source, int? YearBuilt, ServiceLineMaterial ServiceLine,
    bool ChildUnder6, bool Returned, Band? Band, Band? LeadBand, Band? CopperBand,
    IReadOnlyList<(double Value, bool Below)> FirstDrawLead, int? DaysToLetter);

/// <summary>
/// Reads every kit once per report: the protected table is decided over the whole store, so every answer is a look-up
/// in the same set, whatever was asked before.
/// </summary>
public static class ReportKits
{
    public static async Task<List<ReportKit>> LoadAsync(CommunityLeadDb db, ProgramCalendar calendar, CancellationToken ct)
    {
        // The kits are read as a stream and each made a report kit at once, with its lead values and days looked up:
        // a list of every row, then a look-up of every result, then copies of both, held three times what is kept
        // (a million kits peaked at 2.1 GB).
        var lead = new Dictionary<int, (double Value, bool Below)[]>();
        await foreach (var r in ReportKitReading.FirstDrawLeadAsync(db, ct))
            lead[r.KitId] = lead.TryGetValue(r.KitId, out var earlier) ? [.. earlier, (r.Value, r.Below)] : [(r.Value, r.Below)];
        var days = await DaysToLetter(db).ToDictionaryAsync(d => d.KitId, d => d.Days, ct);
        // A million kits name a few dozen areas: one string each in the set kept, not one per kit.
        var areas = new Dictionary<string, string>(StringComparer.Ordinal);
        var kits = new List<ReportKit>();
        var ids = new List<int>();
        var ascending = true;
        await foreach (var k in ReportKitReading.KitsAsync(db, ct))
        {
            ascending &= ids.Count == 0 || k.Id > ids[^1];
            ids.Add(k.Id);
            kits.Add(new ReportKit(k.Kind == KitKind.Soil ? ReportKitKind.Soil : ReportKitKind.Water, Month(calendar.DateOf(k.DatedUtc)),
                areas.TryGetValue(k.AreaCode, out var area) ? area : areas[k.AreaCode] = k.AreaCode, k.WaterSource, k.YearBuilt,
                k.ServiceLine, k.ChildUnder6, k.Returned, k.Band, k.LeadBand, k.CopperBand,
                lead.GetValueOrDefault(k.Id, []), days.TryGetValue(k.Id, out var d) ? d : null));
        }
        if (ascending) return kits;
        // The protection depends on the kits' order, so it is the order of their ids whatever order the store read them in
        // (SQLite reads them in that order already; PostgreSQL need not).
        var sorted = kits.ToArray();
        Array.Sort(ids.ToArray(), sorted);
        return [.. sorted];
    }

    // The three queries a decision reads, public so a test can ask each store for its plan (ReportQueryPlanTests). A kit
    // is dated by its collection, or by its issue until collected: one column read, not two, as reading and parsing
    // stored dates is much of a decision's time.
    public sealed record KitRow(int Id, KitKind Kind, DateTime DatedUtc, string AreaCode, WaterSource WaterSource,
        int? YearBuilt, ServiceLineMaterial ServiceLine, bool ChildUnder6, bool Returned, Band? Band, Band? LeadBand, Band? CopperBand);
    public sealed record LeadRow(int KitId, double Value, bool Below);
    public sealed record DaysRow(int KitId, int Days);

    public static IQueryable<KitRow> KitRows(CommunityLeadDb db) => db.Kits.AsNoTracking().Select(k => new KitRow(
        k.Id, k.Kind, k.CollectedAtUtc ?? k.IssuedAtUtc, k.Household!.AreaCode, k.Household.WaterSource, k.Household.YearBuilt, k.Household.ServiceLine,
        k.Household.ChildUnder6, k.ReceivedAt != null, k.Band, k.LeadBand, k.CopperBand));

    /// <summary>First-draw lead (sequential bottle 1 counts as the first draw) from results in effect, not from held batches.</summary>
    public static IQueryable<LeadRow> FirstDrawLead(CommunityLeadDb db) => db.LabResults.AsNoTracking()
        .Where(r => r.SupersededAtUtc == null && r.Analyte == Analyte.Lead && r.Batch!.Status != BatchStatus.Held
                    && (r.Bottle == BottleType.FirstDraw || (r.Bottle == BottleType.Sequential && r.Position == 1)))
        .Select(r => new LeadRow(r.KitId, r.Value, r.Qualifier == "<"));

    /// <summary>Days from collection to the kit's first letter.</summary>
    public static IQueryable<DaysRow> DaysToLetter(CommunityLeadDb db) => db.Letters.AsNoTracking().Where(l => l.DaysFromCollection != null)
        .GroupBy(l => l.KitId).Select(g => new DaysRow(g.Key, g.Min(l => l.DaysFromCollection!.Value)));

    /// <summary>
    /// The report month (yyyymm) of the collection, or of the issue for a kit not yet collected, on the program's own
    /// calendar: a sample taken on the evening of 31 October in the Americas is October's, though UTC says November.
    /// </summary>
    private static int Month(DateOnly date) => date.Year * 100 + date.Month;
}
