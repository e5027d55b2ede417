using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Features.Reports;

public enum SummaryGrouping { Area, Month, Quarter, AgeBand, ServiceLine, Band }

/// <summary>Housing age bands; 1986 is when federal law required lead-free plumbing.</summary>
public enum AgeBand { Before1950, From1950To1985, From1986, Unknown }

/// <summary>The summary's filters and grouping, parsed from the query string with field-named errors.</summary>
public sealed record SummaryRequest(
    DateOnly? From, DateOnly? To, string? AreaCode, WaterSource? WaterSource, AgeBand? AgeBand,
    ServiceLineMaterial? ServiceLine, SummaryGrouping GroupBy, bool Csv)
{
    /// <summary>The same words the grouping uses for its rows.</summary>
    public static readonly Dictionary<string, AgeBand> AgeBands = new(StringComparer.OrdinalIgnoreCase)
    {
        ["before-1950"] = Reports.AgeBand.Before1950, ["1950-1985"] = Reports.AgeBand.From1950To1985,
        ["1986-and-later"] = Reports.AgeBand.From1986, ["unknown"] = Reports.AgeBand.Unknown,
    };

    /// <summary>
    /// No sample is taken before 2000 (the kits' own earliest time); the far end is ours. Bounded so that a month's
    /// end plus one day (9999-12-31) never leaves the calendar.
    /// </summary>
    public static readonly DateOnly EarliestDate = new(2000, 1, 1), LatestDate = new(2999, 12, 31);

    public static (SummaryRequest? Request, Dictionary<string, string[]> Errors) Parse(IQueryCollection q)
    {
        var errors = new Dictionary<string, string[]>();
        DateOnly? Date(string name)
        {
            if (q[name].ToString() is not { Length: > 0 } text) return null;
            if (!DateOnly.TryParseExact(text, "yyyy-MM-dd", out var d)) errors[name] = ["Use a date like 2026-04-01."];
            else if (d < EarliestDate || d > LatestDate)
                errors[name] = [$"Reports cover {EarliestDate:yyyy-MM-dd} to {LatestDate:yyyy-MM-dd}; use a date in between."];
            else return d;
            return null;
        }
        T? Enum<T>(string name) where T : struct, System.Enum
        {
            if (q[name].ToString() is not { Length: > 0 } text) return null;
            if (KebabEnum.TryParse<T>(text, out var v)) return v;
            errors[name] = [$"Use one of: {KebabEnum.Allowed<T>()}."];
            return null;
        }
        var from = Date("from");
        var to = Date("to");
        // Whole months only: two reports a day apart would otherwise reveal, by their difference, a count too small to show.
        if (from is { Day: not 1 }) errors["from"] = ["Reports start on the first day of a month, like 2026-04-01."];
        if (to is { } t && t.AddDays(1).Day != 1) errors["to"] = ["Reports end on the last day of a month, like 2026-06-30."];
        if (from > to) errors["to"] = ["'to' is before 'from'."];
        var groupBy = Enum<SummaryGrouping>("groupBy") ?? SummaryGrouping.Area;
        var format = q["format"].ToString();
        if (format is not ("" or "json" or "csv")) errors["format"] = ["Use json or csv."];
        AgeBand? ageBand = null;
        if (q["ageBand"].ToString() is { Length: > 0 } age)
        {
            if (AgeBands.TryGetValue(age, out var band)) ageBand = band;
            else errors["ageBand"] = [$"Use one of: {string.Join(", ", AgeBands.Keys)}."];
        }
        var request = new SummaryRequest(from, to, q["areaCode"].ToString() is { Length: > 0 } a ? a.Trim().ToLowerInvariant() : null,
            Enum<WaterSource>("waterSource"), ageBand, Enum<ServiceLineMaterial>("serviceLine"), groupBy, format == "csv");
        return (errors.Count == 0 ? request : null, errors);
    }
}
