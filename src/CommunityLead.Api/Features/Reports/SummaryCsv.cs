using System.Globalization;
using System.Text;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// The same table as text/csv. A hidden cell reads "suppressed". Any cell starting with = + - @ (or a tab or
/// carriage return) gets a leading apostrophe, so a spreadsheet never runs it as a formula.
/// </summary>
public static class SummaryCsv
{
    private static readonly string[] BandNames = ["not-detected", "low", "advisory", "action", "urgent", "retest"];

    public static string Write(SummaryReport report)
    {
        var header = new List<string> { report.GroupBy, "kitsIssued", "kitsReturned", "kitsAnalyzed", "kitsNeedingRetest", "kitsFromHomesWithChildUnder6" };
        header.AddRange(BandNames.Select(b => $"lead:{b}"));
        header.AddRange(BandNames.Select(b => $"copper:{b}"));
        header.AddRange(["shareAtOrAboveActionLevel", "shareLow95", "shareHigh95", "firstDrawLead90thPercentile",
            "firstDrawLeadMedian", "firstDrawLead75thPercentile", "daysToLetterMedian", "daysToLetter90thPercentile"]);
        var text = new StringBuilder();
        Line(text, header);
        foreach (var row in report.Rows.Append(report.Total)) Line(text, Values(row));
        // The data steward's lines after the table: what protects it and what it hides.
        if (report.Protection is { } p)
        {
            Line(text, ["protection", p.Design]);
            Line(text, ["suppressionThreshold", Number(p.SuppressionThreshold)]);
            Line(text, ["minimumHiddenRange", Number(p.MinimumHiddenRange)]);
            Line(text, ["hiddenInThisReport", $"{p.HiddenInThisReport} of {p.CountsInThisReport}"]);
            Line(text, ["hiddenInProtectedSet", $"{p.HiddenInProtectedSet} of {p.CountsInProtectedSet}"]);
            Line(text, ["explanation", p.Explanation]);
        }
        return text.ToString();
    }

    private static IEnumerable<string> Values(SummaryRow r)
    {
        yield return r.Group;
        foreach (var c in new[] { r.KitsIssued, r.KitsReturned, r.KitsAnalyzed, r.KitsNeedingRetest, r.KitsFromHomesWithChildUnder6 }) yield return Cell(c);
        foreach (var bands in new[] { r.Lead, r.Copper })
            foreach (var c in new[] { bands?.NotDetected, bands?.Low, bands?.Advisory, bands?.Action, bands?.Urgent, bands?.Retest }) yield return Cell(c);
        yield return Number(r.ShareAtOrAboveActionLevel?.Proportion);
        yield return Number(r.ShareAtOrAboveActionLevel?.Low95);
        yield return Number(r.ShareAtOrAboveActionLevel?.High95);
        yield return Number(r.FirstDrawLead90thPercentile?.Value);
        yield return Quantile(r.FirstDrawLeadMedian);
        yield return Quantile(r.FirstDrawLead75thPercentile);
        yield return Number(r.DaysToLetterMedian);
        yield return Number(r.DaysToLetter90thPercentile);
    }

    /// <summary>Blank where the count is not part of this table (copper bands, child homes: see their groupings).</summary>
    private static string Cell(Cell? c) => c is null ? "" : c.Suppressed ? "suppressed" : c.Value!.Value.ToString(CultureInfo.InvariantCulture);

    private static string Number(double? v) => v?.ToString("0.####", CultureInfo.InvariantCulture) ?? "";

    private static string Quantile(LeadQuantile? q) => q is null ? "" : (q.AtMost ? "<=" : "") + Number(q.Value);

    private static void Line(StringBuilder text, IEnumerable<string> cells) =>
        text.Append(string.Join(',', cells.Select(Escape))).Append('\n');

    public static string Escape(string cell)
    {
        if (cell.Length > 0 && cell[0] is '=' or '+' or '-' or '@' or '\t' or '\r') cell = "'" + cell;
        return cell.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? $"\"{cell.Replace("\"", "\"\"")}\"" : cell;
    }
}
