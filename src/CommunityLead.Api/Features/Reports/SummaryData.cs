using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Reports;

/// <summary>One kit reduced to what a report may count: its group, never its household's identity.</summary>
public sealed class KeyedKit
{
    public int Id { get; set; }
    public Guid HouseholdId { get; set; }
    public string Key { get; set; } = "";
    public bool ChildUnder6 { get; set; }
    public bool Returned { get; set; }
    public Band? LeadBand { get; set; }
    public Band? CopperBand { get; set; }
}

public sealed record GroupCounts(string Key, int Issued, int Returned, int ChildHomes, int[] Lead, int[] Copper);

public sealed record GroupValues(string Key, List<(double Value, bool Below)> FirstDrawLead, List<int> DaysToLetter);

/// <summary>
/// The database work of a summary: filtering and counting in one GROUP BY, and reading only the values the
/// order statistics need (first-draw lead, days to letter).
/// </summary>
public static class SummaryData
{
    public static readonly Band[] Bands = [Band.NotDetected, Band.Low, Band.Advisory, Band.Action, Band.Urgent, Band.Retest];

    public static IQueryable<KeyedKit> Kits(CommunityLeadDb db, SummaryRequest r)
    {
        var kits = db.Kits.AsNoTracking();
        if (r.From is { } from)
        {
            var start = from.ToDateTime(TimeOnly.MinValue, DateTimeKind.Utc);
            kits = kits.Where(k => (k.CollectedAtUtc ?? k.IssuedAtUtc) >= start);
        }
        if (r.To is { } to)
        {
            var end = to.AddDays(1).ToDateTime(TimeOnly.MinValue, DateTimeKind.Utc);
            kits = kits.Where(k => (k.CollectedAtUtc ?? k.IssuedAtUtc) < end);
        }
        if (r.AreaCode is { } area) kits = kits.Where(k => k.Household!.AreaCode == area);
        if (r.WaterSource is { } source) kits = kits.Where(k => k.Household!.WaterSource == source);
        if (r.ServiceLine is { } line) kits = kits.Where(k => k.Household!.ServiceLine == line);
        kits = r.AgeBand switch
        {
            AgeBand.Before1950 => kits.Where(k => k.Household!.YearBuilt < 1950),
            AgeBand.From1950To1985 => kits.Where(k => k.Household!.YearBuilt >= 1950 && k.Household.YearBuilt < 1986),
            AgeBand.From1986 => kits.Where(k => k.Household!.YearBuilt >= 1986),
            AgeBand.Unknown => kits.Where(k => k.Household!.YearBuilt == null),
            _ => kits,
        };
        return r.GroupBy switch
        {
            SummaryGrouping.Area => kits.Select(k => new KeyedKit { Key = k.Household!.AreaCode, Id = k.Id, HouseholdId = k.HouseholdId, ChildUnder6 = k.Household.ChildUnder6, Returned = k.ReceivedAt != null, LeadBand = k.LeadBand, CopperBand = k.CopperBand }),
            SummaryGrouping.Month => kits.Select(k => new KeyedKit { Key = k.PeriodMonth.ToString(), Id = k.Id, HouseholdId = k.HouseholdId, ChildUnder6 = k.Household!.ChildUnder6, Returned = k.ReceivedAt != null, LeadBand = k.LeadBand, CopperBand = k.CopperBand }),
            SummaryGrouping.Quarter => kits.Select(k => new KeyedKit { Key = (k.PeriodMonth / 100 * 10 + (k.PeriodMonth % 100 + 2) / 3).ToString(), Id = k.Id, HouseholdId = k.HouseholdId, ChildUnder6 = k.Household!.ChildUnder6, Returned = k.ReceivedAt != null, LeadBand = k.LeadBand, CopperBand = k.CopperBand }),
            SummaryGrouping.AgeBand => kits.Select(k => new KeyedKit { Key = k.Household!.YearBuilt == null ? "unknown" : k.Household.YearBuilt < 1950 ? "before-1950" : k.Household.YearBuilt < 1986 ? "1950-1985" : "1986-and-later", Id = k.Id, HouseholdId = k.HouseholdId, ChildUnder6 = k.Household.ChildUnder6, Returned = k.ReceivedAt != null, LeadBand = k.LeadBand, CopperBand = k.CopperBand }),
            SummaryGrouping.ServiceLine => kits.Select(k => new KeyedKit { Key = k.Household!.ServiceLine == ServiceLineMaterial.Lead ? "lead" : k.Household.ServiceLine == ServiceLineMaterial.Galvanized ? "galvanized" : k.Household.ServiceLine == ServiceLineMaterial.Copper ? "copper" : k.Household.ServiceLine == ServiceLineMaterial.Plastic ? "plastic" : "unknown", Id = k.Id, HouseholdId = k.HouseholdId, ChildUnder6 = k.Household.ChildUnder6, Returned = k.ReceivedAt != null, LeadBand = k.LeadBand, CopperBand = k.CopperBand }),
            _ => kits.Select(k => new KeyedKit { Key = k.Band == null ? "not-interpreted" : k.Band == Band.NotDetected ? "not-detected" : k.Band == Band.Low ? "low" : k.Band == Band.Advisory ? "advisory" : k.Band == Band.Action ? "action" : k.Band == Band.Urgent ? "urgent" : "retest", Id = k.Id, HouseholdId = k.HouseholdId, ChildUnder6 = k.Household!.ChildUnder6, Returned = k.ReceivedAt != null, LeadBand = k.LeadBand, CopperBand = k.CopperBand }),
        };
    }

    public static async Task<List<GroupCounts>> CountAsync(IQueryable<KeyedKit> kits, CancellationToken ct)
    {
        var rows = await kits.GroupBy(k => k.Key).Select(g => new
        {
            g.Key,
            Issued = g.Count(),
            Returned = g.Count(k => k.Returned),
            ChildHomes = g.Count(k => k.ChildUnder6),
            L0 = g.Count(k => k.LeadBand == Band.NotDetected), L1 = g.Count(k => k.LeadBand == Band.Low),
            L2 = g.Count(k => k.LeadBand == Band.Advisory), L3 = g.Count(k => k.LeadBand == Band.Action),
            L4 = g.Count(k => k.LeadBand == Band.Urgent), L5 = g.Count(k => k.LeadBand == Band.Retest),
            C0 = g.Count(k => k.CopperBand == Band.NotDetected), C1 = g.Count(k => k.CopperBand == Band.Low),
            C2 = g.Count(k => k.CopperBand == Band.Advisory), C3 = g.Count(k => k.CopperBand == Band.Action),
            C4 = g.Count(k => k.CopperBand == Band.Urgent), C5 = g.Count(k => k.CopperBand == Band.Retest),
        }).ToListAsync(ct);
        return [.. rows.OrderBy(r => r.Key, StringComparer.Ordinal).Select(r => new GroupCounts(r.Key, r.Issued, r.Returned, r.ChildHomes,
            [r.L0, r.L1, r.L2, r.L3, r.L4, r.L5], [r.C0, r.C1, r.C2, r.C3, r.C4, r.C5]))];
    }

    /// <summary>First-draw lead (sequential bottle 1 counts as the first draw) from results in effect, and days to letter.</summary>
    public static async Task<Dictionary<string, GroupValues>> ValuesAsync(CommunityLeadDb db, IQueryable<KeyedKit> kits, CancellationToken ct)
    {
        var lead = await db.LabResults.AsNoTracking()
            .Where(r => r.SupersededAtUtc == null && r.Analyte == Analyte.Lead && r.Batch!.Status != BatchStatus.Held
                        && (r.Bottle == BottleType.FirstDraw || (r.Bottle == BottleType.Sequential && r.Position == 1)))
            .Join(kits, r => r.KitId, k => k.Id, (r, k) => new { k.Key, r.Value, Below = r.Qualifier == "<" })
            .ToListAsync(ct);
        var days = await db.Letters.AsNoTracking().Where(l => l.DaysFromCollection != null)
            .GroupBy(l => l.KitId).Select(g => new { KitId = g.Key, Days = g.Min(l => l.DaysFromCollection!.Value) })
            .Join(kits, d => d.KitId, k => k.Id, (d, k) => new { k.Key, d.Days })
            .ToListAsync(ct);
        var leadByKey = lead.ToLookup(x => x.Key, x => (x.Value, x.Below));
        var daysByKey = days.ToLookup(x => x.Key, x => x.Days);
        return lead.Select(x => x.Key).Concat(days.Select(x => x.Key)).Distinct()
            .ToDictionary(key => key, key => new GroupValues(key, [.. leadByKey[key]], [.. daysByKey[key]]));
    }
}
