using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Reports;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// Turns group counts and values into the published table. Small counts are suppressed, with complements so
/// no hidden count can be worked back from row or column totals; a group's statistics are hidden whenever
/// the counts behind them are.
/// </summary>
public static class SummaryBuilder
{
    public static SummaryReport Build(SummaryRequest request, IReadOnlyList<GroupCounts> groups,
        IReadOnlyDictionary<string, GroupValues> values, ReportOptions options)
    {
        var t = options.SuppressionThreshold;
        if (groups.Count == 0) groups = [new GroupCounts("none", 0, 0, 0, new int[6], new int[6])];
        var lead = CellSuppression.Suppress([.. groups.Select(g => g.Lead)], t);
        var copper = CellSuppression.Suppress([.. groups.Select(g => g.Copper)], t);
        var issued = CellSuppression.Suppress([.. groups.Select(g => new[] { g.Issued })], t);
        var returned = CellSuppression.Suppress([.. groups.Select(g => new[] { g.Returned })], t);
        var child = CellSuppression.Suppress([.. groups.Select(g => new[] { g.ChildHomes })], t);

        var rows = groups.Select((g, i) => Row(Label(request.GroupBy, g.Key), g, values.GetValueOrDefault(g.Key), options,
            issued.Suppressed[i][0], returned.Suppressed[i][0], child.Suppressed[i][0], lead.RowTotalsSuppressed[i],
            lead.Suppressed[i], copper.Suppressed[i])).ToList();

        var sum = new GroupCounts("total", groups.Sum(g => g.Issued), groups.Sum(g => g.Returned), groups.Sum(g => g.ChildHomes),
            [.. Enumerable.Range(0, 6).Select(j => groups.Sum(g => g.Lead[j]))], [.. Enumerable.Range(0, 6).Select(j => groups.Sum(g => g.Copper[j]))]);
        var allValues = new GroupValues("total", [.. values.Values.SelectMany(v => v.FirstDrawLead)], [.. values.Values.SelectMany(v => v.DaysToLetter)]);
        var total = Row("total", sum, allValues, options, issued.ColumnTotalsSuppressed[0], returned.ColumnTotalsSuppressed[0],
            child.ColumnTotalsSuppressed[0], lead.GrandTotalSuppressed, lead.ColumnTotalsSuppressed, copper.ColumnTotalsSuppressed);

        return new SummaryReport(KebabEnum.Name(request.GroupBy), t, "lead µg/L (first draw); days", rows, total,
        [
            $"Counts from 1 to {t} are hidden, and so are other cells where needed so that hidden counts cannot be worked out from totals.",
            "The 90th percentile uses the method of 40 CFR 141.80(c)(3) and is informational only: the homes tested are volunteers, not a compliance sample.",
            $"When 0.9 × n is not a whole number, the rank is found by: {KebabEnum.Name(options.NinetiethRounding)}.",
            "Median and 75th percentile of lead treat results below the reporting limit as censored (Kaplan–Meier), never as half the limit.",
            "Kits that were re-issued for the same home are counted once each.",
        ]);
    }

    private static SummaryRow Row(string label, GroupCounts g, GroupValues? v, ReportOptions options, bool issuedHidden, bool returnedHidden,
        bool childHidden, bool analyzedHidden, bool[] leadHidden, bool[] copperHidden)
    {
        var t = options.SuppressionThreshold;
        var analyzed = g.Lead.Sum();
        var retest = g.Lead[5];
        var leadCells = Cells(g.Lead, leadHidden);
        // A statistic would reveal what the hidden cells hide: it goes when they do, or when too few homes are behind it.
        bool TooFew(int n) => n >= 1 && n <= t;
        var judged = analyzed - retest;
        var shareHidden = analyzedHidden || leadHidden[3] || leadHidden[4] || leadHidden[5] || TooFew(judged);
        ShareWithInterval? share = null;
        if (!shareHidden && WilsonScore.Interval(g.Lead[3] + g.Lead[4], judged) is { } w)
            share = new ShareWithInterval(w.Proportion, w.Low, w.High, judged);

        var leadValues = v?.FirstDrawLead ?? [];
        var valuesHidden = analyzedHidden || TooFew(leadValues.Count);
        Ninetieth? p90 = null;
        LeadQuantile? median = null, p75 = null;
        if (!valuesHidden && leadValues.Count > 0)
        {
            if (NinetiethPercentile.Compute([.. leadValues.Select(x => x.Value)], options.NinetiethRounding, options.FiveSampleRule) is { } n)
                p90 = new Ninetieth(n.Value, n.SampleCount, n.Method, "informational");
            var censored = leadValues.Select(x => new CensoredValue(x.Value, x.Below)).ToList();
            median = Quantile(censored, 0.5);
            p75 = Quantile(censored, 0.75);
        }
        var days = v?.DaysToLetter ?? [];
        double? daysMedian = null, days90 = null;
        if (!TooFew(days.Count) && days.Count > 0)
        {
            var sorted = days.Order().ToList();
            daysMedian = sorted.Count % 2 == 1 ? sorted[sorted.Count / 2] : (sorted[sorted.Count / 2 - 1] + sorted[sorted.Count / 2]) / 2.0;
            days90 = NinetiethPercentile.Compute([.. sorted.Select(d => (double)d)], options.NinetiethRounding, fiveSampleRule: false)?.Value;
        }
        var anyHidden = issuedHidden || returnedHidden || childHidden || analyzedHidden || leadHidden.Any(h => h) || copperHidden.Any(h => h);
        return new SummaryRow(label, Cell.Of(g.Issued, issuedHidden), Cell.Of(g.Returned, returnedHidden), Cell.Of(analyzed, analyzedHidden),
            leadCells.Retest, Cell.Of(g.ChildHomes, childHidden), leadCells, Cells(g.Copper, copperHidden),
            share, p90, median, p75, daysMedian, days90, anyHidden);
    }

    private static LeadQuantile? Quantile(IReadOnlyList<CensoredValue> values, double p) =>
        KaplanMeier.Quantile(values, p) is { } q ? new LeadQuantile(q.Value, q.IsUpperBound) : null;

    private static BandCells Cells(int[] counts, bool[] hidden) => new(
        Cell.Of(counts[0], hidden[0]), Cell.Of(counts[1], hidden[1]), Cell.Of(counts[2], hidden[2]),
        Cell.Of(counts[3], hidden[3]), Cell.Of(counts[4], hidden[4]), Cell.Of(counts[5], hidden[5]));

    private static string Label(SummaryGrouping grouping, string key) => grouping switch
    {
        SummaryGrouping.Month when key.Length == 6 => $"{key[..4]}-{key[4..]}",
        SummaryGrouping.Quarter when key.Length == 5 => $"{key[..4]}-Q{key[4]}",
        _ => key,
    };
}
