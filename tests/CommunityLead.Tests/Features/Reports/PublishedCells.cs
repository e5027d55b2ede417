using CommunityLead.Api.Features.Reports;

namespace CommunityLead.Tests.Features.Reports;

/// <summary>A count as the attacker addresses it: kind, period ("all", "2026", "2026-Q2", "2026-04"), dimension and value ("" for all), column.</summary>
public sealed record PublishedCell(string Kind, string Period, string Dimension, string Value, string Column);

/// <summary>Reads every count of one answer, addressed by what was asked, written apart from the service's own keys.</summary>
public static class PublishedCells
{
    public static readonly string[] Columns = ["issued", "returned", "analyzed", "not-detected", "low", "advisory", "action", "urgent", "retest"];

    private static readonly Dictionary<string, string> FilterDimensions = new()
    {
        ["areaCode"] = "area", ["waterSource"] = "water-source", ["ageBand"] = "age-band", ["serviceLine"] = "service-line",
    };

    public static IEnumerable<(PublishedCell Cell, Cell Count)> Of(string query, SummaryReport report)
    {
        var q = ReportStore.Query(query);
        var filter = FilterDimensions.Keys.FirstOrDefault(f => q.ContainsKey(f));
        var (fd, fv) = filter is null ? ("", "") : (FilterDimensions[filter], q[filter].ToString());
        var byPeriod = report.GroupBy is "month" or "quarter" or "year";
        foreach (var row in report.Rows)
        {
            var (kind, period, d, v) = report.GroupBy == "kit-kind" ? (row.Group, report.Period, "", "")
                : byPeriod ? (report.KitKind, row.Group, fd, fv) : (report.KitKind, report.Period, report.GroupBy, row.Group);
            foreach (var c in Counts(row)) yield return (new PublishedCell(kind, period, d, v, c.Column), c.Count);
        }
        if (report.GroupBy != "kit-kind")
            foreach (var c in Counts(report.Total)) yield return (new PublishedCell(report.KitKind, report.Period, fd, fv, c.Column), c.Count);
    }

    private static IEnumerable<(string Column, Cell Count)> Counts(SummaryRow r) =>
    [
        ("issued", r.KitsIssued), ("returned", r.KitsReturned), ("analyzed", r.KitsAnalyzed), ("not-detected", r.Lead.NotDetected),
        ("low", r.Lead.Low), ("advisory", r.Lead.Advisory), ("action", r.Lead.Action), ("urgent", r.Lead.Urgent), ("retest", r.Lead.Retest),
        ("retest", r.KitsNeedingRetest),
    ];

    public static int[] Months(string period) => period switch
    {
        "all" or "2026" => [.. Enumerable.Range(1, 12)],
        _ when period.Contains("-Q") => [.. Enumerable.Range(3 * (period[^1] - '0') - 2, 3)],
        _ => [int.Parse(period[5..])],
    };

    /// <summary>Leaves: 0 awaiting return, 1 awaiting a result, 2..7 the lead bands in column order.</summary>
    public static int[] Leaves(string column) => column switch
    {
        "issued" => [0, 1, 2, 3, 4, 5, 6, 7],
        "returned" => [1, 2, 3, 4, 5, 6, 7],
        "analyzed" => [2, 3, 4, 5, 6, 7],
        _ => [Array.IndexOf(Columns, column) - 1],
    };
}
