using CommunityLead.Rules.Reports.Protection;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// The fixed periods: from and to must cover exactly one calendar month, quarter or year (collection date; kits not
/// yet collected count by their issue date). Free ranges would let two overlapping reports be subtracted.
/// </summary>
public static class SummaryPeriod
{
    public static long Parse(string fromText, string toText, Dictionary<string, string[]> errors)
    {
        if (fromText.Length == 0 && toText.Length == 0) return PeriodNode.All;
        var from = Date("from", fromText, errors);
        var to = Date("to", toText, errors);
        if (from is { Day: not 1 }) errors["from"] = ["Reports start on the first day of a month, like 2026-04-01."];
        if (to is { } t && t.AddDays(1).Day != 1) errors["to"] = ["Reports end on the last day of a month, like 2026-06-30."];
        if (from is not { Day: 1 } f || to is not { } end || end.AddDays(1).Day != 1) return PeriodNode.All;
        var months = (end.Year - f.Year) * 12 + end.Month - f.Month + 1;
        var month = f.Year * 100 + f.Month;
        if (months == 1) return month;
        if (months == 3 && f.Month % 3 == 1) return PeriodNode.Quarter(month);
        if (months == 12 && f.Month == 1) return PeriodNode.Year(month);
        errors["to"] = ["From and to must cover one whole month, quarter or year, like 2026-04-01 to 2026-06-30."];
        return PeriodNode.All;
    }

    /// <summary>
    /// No sample is taken before 2000 (the kits' own earliest time); the far end is ours. Bounded so that a period's
    /// end plus one day (9999-12-31) never leaves the calendar.
    /// </summary>
    public static readonly DateOnly EarliestDate = new(2000, 1, 1), LatestDate = new(2999, 12, 31);

    private static DateOnly? Date(string name, string text, Dictionary<string, string[]> errors)
    {
        if (text.Length == 0)
        {
            errors[name] = [$"Give both from and to (one whole month, quarter or year), or neither."];
            return null;
        }
        if (!DateOnly.TryParseExact(text, "yyyy-MM-dd", out var d)) errors[name] = ["Use a date like 2026-04-01."];
        else if (d < EarliestDate || d > LatestDate)
            errors[name] = [$"Reports cover {EarliestDate:yyyy-MM-dd} to {LatestDate:yyyy-MM-dd}; use a date in between."];
        else return d;
        return null;
    }

    /// <summary>The period level a grouping's rows sit at (-1 for groupings that are not periods).</summary>
    public static int Level(SummaryGrouping g) => g switch
    {
        SummaryGrouping.Month => 0,
        SummaryGrouping.Quarter => 1,
        SummaryGrouping.Year => 2,
        _ => -1,
    };

    public static string Label(long node) => PeriodNode.Level(node) switch
    {
        0 => $"{node / 100:0000}-{node % 100:00}",
        1 => $"{(node - 1_000_000) / 10:0000}-Q{(node - 1_000_000) % 10}",
        2 => $"{node - 2_000_000:0000}",
        _ => "all",
    };
}
