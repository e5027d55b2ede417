using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Reports.Protection;
using static CommunityLead.Api.Features.Reports.ReportDimensions;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// Answers one query from the protected table set: every row and the total are look-ups of cells decided once for
/// the whole set, so no choice of filters or periods can show a different decision for the same cell.
/// </summary>
public static class SummaryBuilder
{
    /// <param name="timeZone">The program's time zone (Program:TimeZone), whose calendar the months, quarters and years follow.</param>
    public static SummaryReport Build(SummaryRequest request, Dictionary<ReportKitKind, KindTable> tables, ReportOptions options,
        string timeZone = "UTC")
    {
        var seen = new HashSet<(ReportKitKind, CellKey)>();
        List<SummaryRow> rows;
        SummaryRow total;
        if (request.GroupBy == SummaryGrouping.KitKind)
        {
            rows = [.. tables.Values.Select(kt => Row(KebabEnum.Name(kt.Kind), kt, Group(request, kt, request.Period), options, seen))];
            total = NotAdded();
        }
        else
        {
            var kt = tables[request.Kind];
            rows = [.. RowGroups(request, kt).Select(g => Row(g.Label, kt, g.Group, options, seen))];
            total = Row("total", kt, Group(request, kt, request.Period), options, seen);
        }
        var kind = request.GroupBy == SummaryGrouping.KitKind ? "water, soil" : KebabEnum.Name(request.Kind);
        return new SummaryReport(KebabEnum.Name(request.GroupBy), options.SuppressionThreshold, "lead µg/L (first draw); days", rows, total,
            SummaryNotes.For(request, options, timeZone))
        {
            KitKind = kind,
            Period = SummaryPeriod.Label(request.Period),
            Protection = SummaryNotes.Protection(tables, request, options, seen.Count(s => Hidden(tables, s)), seen.Count),
        };
    }

    private static bool Hidden(Dictionary<ReportKitKind, KindTable> tables, (ReportKitKind Kind, CellKey Key) s) => tables[s.Kind].Table.IsHidden(s.Key);

    private static (long Node, int Dimension, int Value) Group(SummaryRequest r, KindTable kt, long node) =>
        r.Filter is { } f ? (node, f.Dimension, Array.IndexOf(kt.Values[f.Dimension], f.Value)) : (node, -1, -1);

    private static IEnumerable<(string Label, (long, int, int) Group)> RowGroups(SummaryRequest r, KindTable kt)
    {
        // A group of nobody is left out, unless one of its zeros is hidden: leaving it out would show the zero.
        bool Present((long Node, int D, int V) g) =>
            Enumerable.Range(0, Shape.ColumnLeaves.Length).Any(c => kt.Table.Count(Key(g, c)) > 0 || kt.Table.IsHidden(Key(g, c)));
        var level = SummaryPeriod.Level(r.GroupBy);
        if (level >= 0)
            return kt.Months.Where(m => PeriodNode.Contains(r.Period, m)).Select(m => PeriodNode.Of(m)[level]).Distinct()
                .Select(node => (SummaryPeriod.Label(node), Group(r, kt, node))).Where(x => Present(x.Item2));
        var d = Array.FindIndex(All, x => x.Grouping == r.GroupBy);
        return kt.Values[d].Select((label, v) => (label, (r.Period, d, v)))
            .Where(x => r.Filter is not { } f || (f.Dimension == d && f.Value == x.label)).Where(x => Present(x.Item2));
    }

    private static CellKey Key((long Node, int D, int V) g, int column) => new(g.Node, g.D, g.V, column);

    private static SummaryRow Row(string label, KindTable kt, (long Node, int D, int V) g, ReportOptions options, HashSet<(ReportKitKind, CellKey)> seen)
    {
        // A filter value no kit has: a group of nobody, all zeros (zeros may show).
        var known = g.D < 0 || g.V >= 0;
        Cell C(int column)
        {
            var key = Key(g, column);
            if (!known) return Cell.Of(0, false);
            seen.Add((kt.Kind, key));
            return Cell.Of(kt.Table.Count(key), kt.Table.IsHidden(key));
        }
        Cell[] cells = [.. Enumerable.Range(0, Shape.ColumnLeaves.Length).Select(C)];
        var anyHidden = cells.Any(c => c.Suppressed);
        var stats = known && !anyHidden && kt.Table.KeptWhole(g.Node, g.D, g.V)
            ? kt.Statistics(g.Node, g.D, g.V) : GroupStatistics.None;
        return new SummaryRow(label, cells[Issued], cells[Returned], cells[Analyzed], cells[7], null,
            new BandCells(cells[2], cells[3], cells[4], cells[5], cells[6], cells[7]), null,
            stats.Share, stats.P90, stats.Median, stats.P75, stats.DaysMedian, stats.Days90, anyHidden);
    }

    /// <summary>Water and soil kits are never added together, so grouping by kind has no total.</summary>
    private static SummaryRow NotAdded()
    {
        var none = new Cell(null, true);
        var bands = new BandCells(none, none, none, none, none, none);
        return new SummaryRow("total", none, none, none, none, null, bands, null, null, null, null, null, null, null, true);
    }
}
