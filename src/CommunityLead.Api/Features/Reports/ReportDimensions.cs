using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Reports.Protection;

namespace CommunityLead.Api.Features.Reports;

/// <summary>A dimension of the protected table: its grouping, the filter that picks one value, and how a kit gets its value.</summary>
public sealed record ReportDimension(SummaryGrouping Grouping, string? Filter, Func<ReportKit, string> ValueOf, string[]? FixedValues);

/// <summary>
/// The finest table the health role can ever see: month × area × water source × age band × service line × overall band
/// × copper band × child under 6, one per kit kind. Each kit sits in one outcome leaf (awaiting return, awaiting a
/// result, or its lead band), so a row's counts are one tree: issued ⊃ returned ⊃ analyzed ⊃ the six lead bands.
/// </summary>
public static class ReportDimensions
{
    public static readonly Band[] Bands = [Band.NotDetected, Band.Low, Band.Advisory, Band.Action, Band.Urgent, Band.Retest];
    private static readonly string[] BandNames = [.. Bands.Select(KebabEnum.Name)];

    public static readonly ReportDimension[] All =
    [
        new(SummaryGrouping.Area, "areaCode", k => k.Area, null),
        new(SummaryGrouping.WaterSource, "waterSource", k => KebabEnum.Name(k.Source), ["public", "private-well"]),
        new(SummaryGrouping.AgeBand, "ageBand", k => AgeBandOf(k.YearBuilt), [.. SummaryRequest.AgeBands.Keys]),
        new(SummaryGrouping.ServiceLine, "serviceLine", k => KebabEnum.Name(k.ServiceLine), ["unknown", "lead", "galvanized", "copper", "plastic"]),
        new(SummaryGrouping.Band, null, k => k.Band is { } b ? KebabEnum.Name(b) : "not-interpreted", ["not-interpreted", .. BandNames]),
        new(SummaryGrouping.CopperBand, null, k => k.CopperBand is { } b ? KebabEnum.Name(b) : "none", ["none", .. BandNames]),
        new(SummaryGrouping.ChildUnderSix, null, k => k.ChildUnder6 ? "yes" : "no", ["no", "yes"]),
    ];

    public const int BandDimension = 4, CopperDimension = 5;

    // Leaves 0 awaiting return, 1 awaiting a result, 2..7 the lead bands; then returned, analyzed, issued.
    public const int Returned = 8, Analyzed = 9, Issued = 10;
    public static readonly TableShape Shape = new([], 8, [[0], [1], [2], [3], [4], [5], [6], [7], [1, 2, 3, 4, 5, 6, 7], [2, 3, 4, 5, 6, 7], [0, 1, 2, 3, 4, 5, 6, 7]]);

    public static int Leaf(ReportKit k) => k.LeadBand is { } b ? 2 + Array.IndexOf(Bands, b) : k.Returned ? 1 : 0;

    public static string AgeBandOf(int? yearBuilt) => yearBuilt switch
    {
        null => "unknown",
        < 1950 => "before-1950",
        < 1986 => "1950-1985",
        _ => "1986-and-later",
    };

    /// <summary>Each dimension's values: the fixed lists, and for areas every code in the store (sorted), so indexes never depend on the query.</summary>
    public static string[][] Values(IEnumerable<ReportKit> kits) =>
        [.. All.Select(d => d.FixedValues ?? [.. kits.Select(d.ValueOf).Distinct().Order(StringComparer.Ordinal)])];

    public static TableShape ShapeFor(string[][] values) => new([.. values.Select(v => v.Length)], Shape.Leaves, Shape.ColumnLeaves);

    /// <summary>Each dimension's value positions, so a kit's record is a look-up per dimension rather than a search.</summary>
    public static Dictionary<string, int>[] Positions(string[][] values) =>
        [.. values.Select(v => v.Select((value, i) => (value, i)).ToDictionary(x => x.value, x => x.i, StringComparer.Ordinal))];

    public static TableRecord Record(ReportKit k, Dictionary<string, int>[] positions)
    {
        var indexes = new int[All.Length];
        for (var i = 0; i < All.Length; i++) indexes[i] = positions[i].GetValueOrDefault(All[i].ValueOf(k), -1);
        return new(k.PeriodMonth, indexes, Leaf(k));
    }

    /// <summary>
    /// Keeps a moved kit believable: its overall band is never below its lead or copper band (the overall band is the
    /// most serious finding), and a kit with no lead result has no bands at all.
    /// </summary>
    public static TableRecord Fit(TableRecord before, TableRecord after)
    {
        if (after.Leaf < 2)
            return before.Leaf >= 2 ? after.With(BandDimension, 0).With(CopperDimension, 0) : after;
        var lead = after.Leaf - 1; // the band dimension's index of the lead band (0 is "not interpreted")
        var band = Math.Max(after.Values[BandDimension], Math.Max(lead, after.Values[CopperDimension]));
        return band == after.Values[BandDimension] ? after : after.With(BandDimension, band);
    }
}
