using System.Collections.Concurrent;
using CommunityLead.Rules.Reports.Protection;

namespace CommunityLead.Api.Features.Reports;

/// <summary>One kind's protected table, with the kits behind it for the statistics of groups that are shown whole.</summary>
public sealed class KindTable(ReportKitKind kind, List<ReportKit> kits, TableRecord[] records, string[][] values, ProtectedTable table,
    ReportOptions options)
{
    // Statistics of every value of one dimension in one period, worked out in a single pass over the kits the first
    // time any of them is asked, then kept with the decided set: a report is then a look-up, not a scan per row.
    private readonly ConcurrentDictionary<(long Node, int Dimension), Dictionary<int, GroupStatistics>> statistics = new();

    public ReportKitKind Kind => kind;
    public string[][] Values => values;
    public ProtectedTable Table => table;

    /// <summary>A group's statistics, or none when the other possible sets of kits give it other members.</summary>
    public GroupStatistics Statistics(long node, int dimension, int value) => !table.KeptWhole(node, dimension, value)
        ? GroupStatistics.None
        : statistics.GetOrAdd((node, dimension), key => Split(key.Node, key.Dimension)).GetValueOrDefault(value, GroupStatistics.None);

    private Dictionary<int, GroupStatistics> Split(long node, int dimension)
    {
        var groups = new Dictionary<int, List<ReportKit>>();
        foreach (var (month, indexes) in byMonth)
        {
            if (!PeriodNode.Contains(node, month)) continue;
            foreach (var i in indexes)
            {
                var value = dimension < 0 ? -1 : records[i].Values[dimension];
                if (!groups.TryGetValue(value, out var members)) groups[value] = members = [];
                members.Add(kits[i]);
            }
        }
        return groups.ToDictionary(g => g.Key, g => SummaryStatistics.Of(g.Value, options));
    }

    // A month's kits, so a month's or a quarter's statistics read only that period's kits.
    private readonly Dictionary<int, List<int>> byMonth = Enumerable.Range(0, records.Length).GroupBy(i => records[i].Month)
        .ToDictionary(g => g.Key, g => g.ToList());

    public IEnumerable<int> Months => byMonth.Keys.Order();
}

/// <summary>The protected table set: decided once over every kit in the store, then every answer is a look-up in it.</summary>
public static class SummaryTables
{
    public static Dictionary<ReportKitKind, KindTable> Protect(IReadOnlyList<ReportKit> kits, ReportOptions options)
    {
        var values = ReportDimensions.Values(kits);
        var shape = ReportDimensions.ShapeFor(values);
        var settings = new ProtectionSettings(options.SuppressionThreshold, options.MinimumHiddenRange);
        var positions = ReportDimensions.Positions(values);
        return Enum.GetValues<ReportKitKind>().ToDictionary(kind => kind, kind =>
        {
            var ofKind = kits.Where(k => k.Kind == kind).ToList();
            TableRecord[] records = [.. ofKind.Select(k => ReportDimensions.Record(k, positions))];
            return new KindTable(kind, ofKind, records, values, TableProtector.Protect(records, shape, settings, ReportDimensions.Fit), options);
        });
    }
}
