namespace CommunityLead.Rules.Reports;

/// <summary>
/// Quantiles of results that include non-detects ("&lt; 1 µg/L"), by the Kaplan–Meier estimate for left-censored data:
/// the survival estimator run on flipped values (Helsel 2005, Nondetects and Data Analysis, ch. 6; EPA Unified
/// Guidance 2009 ch. 15) [published]. Never half the detection limit: that invents values (DOMAIN.md §7).
/// </summary>
public static class KaplanMeier
{
    // Products of fractions such as 9/10 · 8/9 · … · 5/6 land a hair off 0.5; a quantile must not move because of that.
    private const double Tolerance = 1e-9;

    /// <summary>
    /// The p-quantile (0 &lt; p ≤ 1) taken as the smallest measured value whose estimated share at or below it reaches p,
    /// the inverse of the KM step function; with no non-detects that is the ordinary rank ⌈p·n⌉ (Hyndman and Fan type 1).
    /// Null for no values. When the share p is used up below the lowest measured value, returns an upper bound.
    /// </summary>
    public static KaplanMeierQuantile? Quantile(IReadOnlyList<CensoredValue> values, double p)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (!(p > 0 && p <= 1))
            throw new ArgumentOutOfRangeException(nameof(p), p, "p must be above 0 and at most 1.");
        var bad = values.Select((v, i) => (v, i)).FirstOrDefault(x => x.v is null || !double.IsFinite(x.v.Value), (null!, -1));
        if (bad.i >= 0)
            throw new ArgumentException($"Value {bad.i + 1} is not a finite result.", nameof(values));
        if (values.Count == 0)
            return null;

        var steps = Steps(values);
        var reached = steps.FirstOrDefault(s => s.ShareAtOrBelow >= p - Tolerance);
        var lowestShare = steps.Count == 0 ? 1 : steps[0].ShareBelow;
        if (reached is not null && lowestShare < p - Tolerance)
            return new KaplanMeierQuantile(reached.Value, IsUpperBound: false);
        return new KaplanMeierQuantile(CensoredBound(values, p, steps), IsUpperBound: true);
    }

    /// <summary>
    /// The estimated share at or below each distinct measured value, lowest first. Going down from the highest, at
    /// each measured value d results equal it out of b "at risk" (results and non-detect limits at or below it), and
    /// the share below it is the share at or below times (b − d)/b. A non-detect tied with a result counts below it
    /// (Helsel's convention), and one whose limit is above a result spreads its weight over the values below its limit.
    /// </summary>
    private static List<KmStep> Steps(IReadOnlyList<CensoredValue> values)
    {
        var detected = Ascending.Of(values.Where(v => !v.BelowLimit).Select(v => v.Value));
        var limits = Ascending.Of(values.Where(v => v.BelowLimit).Select(v => v.Value));
        var steps = new List<KmStep>();
        var share = 1.0;
        for (var top = detected.Length; top > 0;)
        {
            var value = detected[top - 1];
            var first = Count(detected, value, andEqual: false);
            int equal = top - first, atRisk = top + Count(limits, value, andEqual: true);
            var below = share * (atRisk - equal) / atRisk;
            steps.Add(new KmStep(value, share, below));
            share = below;
            top = first;
        }
        steps.Reverse();
        return steps;
    }

    /// <summary>How many of the ascending values are below x, or at or below it (binary search: reports read many thousands).</summary>
    private static int Count(double[] ascending, double x, bool andEqual)
    {
        int lo = 0, hi = ascending.Length;
        while (lo < hi)
        {
            var mid = (lo + hi) >>> 1;
            if (ascending[mid] < x || (andEqual && ascending[mid] == x)) lo = mid + 1; else hi = mid;
        }
        return lo;
    }

    /// <summary>
    /// Two bounds on the estimate, the tighter one wins. (1) KM leaves the share below the lowest result only on the non-detects whose
    /// limit is at or below it, so the quantile is at or below the highest of those limits. (2) Putting every non-detect at
    /// its limit only moves values up, so the ordinary quantile of those values is never below the real one; with no result
    /// at all this is the only bound (&lt;1, &lt;1, &lt;5 → median ≤ 1).
    /// </summary>
    private static double CensoredBound(IReadOnlyList<CensoredValue> values, double p, List<KmStep> steps)
    {
        var atLimits = Ascending.Of(values.Select(v => v.Value));
        var rank = Math.Clamp((int)Math.Ceiling(p * atLimits.Length - Tolerance), 1, atLimits.Length);
        var substituted = atLimits[rank - 1];
        if (steps.Count == 0)
            return substituted;
        var lowest = steps[0].Value;
        var underLowest = values.Where(v => v.BelowLimit && v.Value <= lowest).Max(v => v.Value);
        return Math.Min(underLowest, substituted);
    }

    private sealed record KmStep(double Value, double ShareAtOrBelow, double ShareBelow);
}
