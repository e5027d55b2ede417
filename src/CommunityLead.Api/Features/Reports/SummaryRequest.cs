using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Reports.Protection;

namespace CommunityLead.Api.Features.Reports;

public enum SummaryGrouping { Area, Month, Quarter, AgeBand, ServiceLine, Band, Year, WaterSource, CopperBand, ChildUnderSix, KitKind }

/// <summary>Housing age bands; 1986 is when federal law required lead-free plumbing.</summary>
public enum AgeBand { Before1950, From1950To1985, From1986, Unknown }

/// <summary>One dimension fixed to one value (the dimension's index in <see cref="ReportDimensions.All"/>).</summary>
public sealed record SummaryFilter(int Dimension, string Value);

/// <summary>
/// The summary's filters and grouping, parsed from the query string with field-named errors. The query space is fixed
/// and finite, so the protected table set can cover all of it: a period is one whole month, quarter or year; at most
/// one household filter, and only beside a grouping by period or by that same dimension.
/// </summary>
public sealed record SummaryRequest(long Period, SummaryFilter? Filter, ReportKitKind? KitKind, SummaryGrouping GroupBy, bool Csv)
{
    /// <summary>The same words the grouping uses for its rows.</summary>
    public static readonly Dictionary<string, AgeBand> AgeBands = new(StringComparer.OrdinalIgnoreCase)
    {
        ["before-1950"] = Reports.AgeBand.Before1950, ["1950-1985"] = Reports.AgeBand.From1950To1985,
        ["1986-and-later"] = Reports.AgeBand.From1986, ["unknown"] = Reports.AgeBand.Unknown,
    };

    public ReportKitKind Kind => KitKind ?? ReportKitKind.Water;

    public static bool IsPeriodGrouping(SummaryGrouping g) => g is SummaryGrouping.Month or SummaryGrouping.Quarter or SummaryGrouping.Year;

    public static (SummaryRequest? Request, Dictionary<string, string[]> Errors) Parse(IQueryCollection q)
    {
        var errors = new Dictionary<string, string[]>();
        T? Enum<T>(string name) where T : struct, System.Enum
        {
            if (q[name].ToString() is not { Length: > 0 } text) return null;
            if (KebabEnum.TryParse<T>(text, out var v)) return v;
            errors[name] = [$"Use one of: {KebabEnum.Allowed<T>()}."];
            return null;
        }
        var period = SummaryPeriod.Parse(q["from"].ToString(), q["to"].ToString(), errors);
        var groupBy = Enum<SummaryGrouping>("groupBy") ?? SummaryGrouping.Area;
        var kind = Enum<ReportKitKind>("kitKind");
        if (kind is not null && groupBy == SummaryGrouping.KitKind)
            errors["kitKind"] = ["Grouping by kit kind already shows each kind; leave kitKind out."];
        var format = q["format"].ToString();
        if (format is not ("" or "json" or "csv")) errors["format"] = ["Use json or csv."];
        if (PeriodNode.Level(period) < SummaryPeriod.Level(groupBy))
            errors["groupBy"] = ["Group by a period shorter than the one asked for (from and to), or leave from and to out."];
        var filter = ParseFilter(q, groupBy, errors);
        var request = new SummaryRequest(period, filter, kind, groupBy, format == "csv");
        return (errors.Count == 0 ? request : null, errors);
    }

    private static SummaryFilter? ParseFilter(IQueryCollection q, SummaryGrouping groupBy, Dictionary<string, string[]> errors)
    {
        var given = ReportDimensions.All.Select((d, i) => (d, i)).Where(x => x.d.Filter is { } f && q[f].ToString().Length > 0).ToList();
        if (given.Count == 0) return null;
        // Two household dimensions crossed (area by age band, say) are mostly cells of a few homes at this program's
        // size: protecting them would hide most of the table, so such a query is not offered at all.
        foreach (var (d, i) in given.Skip(1))
            errors[d.Filter!] = [$"Use one filter at a time: {given[0].d.Filter} is already given."];
        var (dimension, index) = given[0];
        if (!IsPeriodGrouping(groupBy) && groupBy != dimension.Grouping)
            errors[dimension.Filter!] = [$"A filter combines only with groupBy month, quarter or year (or {KebabEnum.Name(dimension.Grouping)} itself): crossing two household dimensions would reveal homes too few to show."];
        var value = q[dimension.Filter!].ToString().Trim().ToLowerInvariant();
        if (dimension.FixedValues is { } allowed && !allowed.Contains(value))
            errors[dimension.Filter!] = [$"Use one of: {string.Join(", ", allowed)}."];
        return new SummaryFilter(index, value);
    }
}
