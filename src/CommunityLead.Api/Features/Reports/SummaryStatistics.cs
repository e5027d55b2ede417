using CommunityLead.Rules.Reports;

namespace CommunityLead.Api.Features.Reports;

public sealed record GroupStatistics(ShareWithInterval? Share, Ninetieth? P90, LeadQuantile? Median, LeadQuantile? P75, double? DaysMedian, double? Days90)
{
    public static readonly GroupStatistics None = new(null, null, null, null, null, null);
}

/// <summary>
/// The order statistics and the share of a group. Called only for a group shown whole (every count shown, the same
/// kits in every possible set), and each statistic still needs more homes behind it than the threshold.
/// </summary>
public static class SummaryStatistics
{
    public static GroupStatistics Of(IReadOnlyList<ReportKit> kits, ReportOptions options)
    {
        var t = options.SuppressionThreshold;
        bool Enough(int n) => n > t || (n > 0 && t == 0);
        var judged = kits.Count(k => k.LeadBand is { } b && b != Rules.Interpretation.Band.Retest);
        var high = kits.Count(k => k.LeadBand is Rules.Interpretation.Band.Action or Rules.Interpretation.Band.Urgent);
        ShareWithInterval? share = null;
        if (Enough(judged) && WilsonScore.Interval(high, judged) is { } w) share = new(w.Proportion, w.Low, w.High, judged);

        var lead = kits.SelectMany(k => k.FirstDrawLead).ToList();
        Ninetieth? p90 = null;
        LeadQuantile? median = null, p75 = null;
        if (Enough(lead.Count))
        {
            if (NinetiethPercentile.Compute([.. lead.Select(x => x.Value)], options.NinetiethRounding, options.FiveSampleRule) is { } n)
                p90 = new Ninetieth(n.Value, n.SampleCount, n.Method, "informational");
            var censored = lead.Select(x => new CensoredValue(x.Value, x.Below)).ToList();
            median = Quantile(censored, 0.5);
            p75 = Quantile(censored, 0.75);
        }
        var days = kits.Where(k => k.DaysToLetter is not null).Select(k => k.DaysToLetter!.Value).ToList();
        days.Sort();
        double? daysMedian = null, days90 = null;
        if (Enough(days.Count))
        {
            daysMedian = days.Count % 2 == 1 ? days[days.Count / 2] : (days[days.Count / 2 - 1] + days[days.Count / 2]) / 2.0;
            days90 = NinetiethPercentile.Compute([.. days.Select(d => (double)d)], options.NinetiethRounding, fiveSampleRule: false)?.Value;
        }
        return new(share, p90, median, p75, daysMedian, days90);
    }

    private static LeadQuantile? Quantile(IReadOnlyList<CensoredValue> values, double p) =>
        KaplanMeier.Quantile(values, p) is { } q ? new LeadQuantile(q.Value, q.IsUpperBound) : null;
}
