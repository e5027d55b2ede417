using CommunityLead.Rules.Reports;

namespace CommunityLead.Tests.Rules.Reports;

/// <summary>
/// Efron's (1967) redistribute-to-the-right form of Kaplan–Meier, on flipped data: order from the highest value down
/// (a result before a non-detect at the same value, so the non-detect counts below it); each observation starts with
/// weight 1/n; a non-detect hands its weight in equal parts to every observation after it. Weight left on the last
/// non-detects is the share below the lowest result. Written separately from the production code, as a cross-check.
/// </summary>
internal static class RedistributeToTheRight
{
    public static KaplanMeierQuantile Quantile(IReadOnlyList<CensoredValue> values, double p)
    {
        var order = values.OrderByDescending(v => v.Value).ThenBy(v => v.BelowLimit).ToArray();
        var weight = Enumerable.Repeat(1.0 / order.Length, order.Length).ToArray();
        for (var i = 0; i < order.Length; i++)
            if (order[i].BelowLimit && i < order.Length - 1)
            {
                for (var k = i + 1; k < order.Length; k++) weight[k] += weight[i] / (order.Length - i - 1);
                weight[i] = 0;
            }
        var leftBelow = weight.Where((_, i) => order[i].BelowLimit).Sum();
        if (leftBelow >= p - 1e-9 || order.All(v => v.BelowLimit))
            return new KaplanMeierQuantile(Bound(values, p, order), true);
        var share = leftBelow;
        foreach (var group in order.Select((v, i) => (v, w: weight[i])).Where(x => !x.v.BelowLimit).GroupBy(x => x.v.Value).OrderBy(g => g.Key))
        {
            share += group.Sum(x => x.w);
            if (share >= p - 1e-9) return new KaplanMeierQuantile(group.Key, false);
        }
        throw new InvalidOperationException("Shares did not reach p.");
    }

    // The bound documented on KaplanMeier: the tighter of the highest limit at or below the lowest result and the
    // quantile with every non-detect set to its limit.
    private static double Bound(IReadOnlyList<CensoredValue> values, double p, CensoredValue[] order)
    {
        var limits = values.Select(v => v.Value).Order().ToArray();
        var substituted = limits[Math.Max(0, (int)Math.Ceiling(p * limits.Length - 1e-9) - 1)];
        var results = order.Where(v => !v.BelowLimit).ToArray();
        if (results.Length == 0) return substituted;
        var lowest = results.Min(v => v.Value);
        return Math.Min(substituted, order.Where(v => v.BelowLimit && v.Value <= lowest).Max(v => v.Value));
    }
}
