using CommunityLead.Rules.Reports.Protection;

namespace CommunityLead.Api.Features.Reports;

/// <summary>One kind's protected table, with the kits behind it for the statistics of groups that are shown whole.</summary>
public sealed class KindTable(ReportKitKind kind, List<ReportKit> kits, TableRecord[] records, string[][] values, ProtectedTable table)
{
    public ReportKitKind Kind => kind;
    public string[][] Values => values;
    public ProtectedTable Table => table;

    public IEnumerable<ReportKit> Members(long node, int dimension, int value) =>
        kits.Where((k, i) => PeriodNode.Contains(node, records[i].Month) && (dimension < 0 || records[i].Values[dimension] == value));

    public IEnumerable<int> Months => records.Select(r => r.Month).Distinct().Order();
}

/// <summary>The protected table set: decided once over every kit in the store, then every answer is a look-up in it.</summary>
public static class SummaryTables
{
    public static Dictionary<ReportKitKind, KindTable> Protect(IReadOnlyList<ReportKit> kits, ReportOptions options)
    {
        var values = ReportDimensions.Values(kits);
        var shape = ReportDimensions.ShapeFor(values);
        var settings = new ProtectionSettings(options.SuppressionThreshold, options.MinimumHiddenRange);
        return Enum.GetValues<ReportKitKind>().ToDictionary(kind => kind, kind =>
        {
            var ofKind = kits.Where(k => k.Kind == kind).ToList();
            TableRecord[] records = [.. ofKind.Select(k => ReportDimensions.Record(k, values))];
            return new KindTable(kind, ofKind, records, values, TableProtector.Protect(records, shape, settings, ReportDimensions.Fit));
        });
    }
}
