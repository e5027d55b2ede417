namespace CommunityLead.Rules.Reports;

/// <summary>
/// The Wilson score interval for a proportion (Wilson 1927, JASA 22:209) [published]. Chosen over the textbook
/// p ± z·√(p(1−p)/n) because that one collapses to zero width at 0 of n and n of n and spills past 0 and 1, which are
/// exactly the shares a small area reports ("0 of 12 homes at or above the action level").
/// </summary>
public static class WilsonScore
{
    /// <summary>The two-sided 95 % standard normal quantile, Φ⁻¹(0.975).</summary>
    public const double Z95 = 1.959963984540054;

    /// <summary>Null when there is nothing to take a share of (n = 0).</summary>
    public static ProportionInterval? Interval(int successes, int n, double z = Z95)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(n);
        if (successes < 0 || successes > n)
            throw new ArgumentOutOfRangeException(nameof(successes), successes, $"Successes must lie between 0 and n = {n}.");
        if (!double.IsFinite(z) || z <= 0)
            throw new ArgumentOutOfRangeException(nameof(z), z, "z must be a positive number.");
        if (n == 0)
            return null;

        // centre = (p + z²/2n) / (1 + z²/n); half width = z/(1 + z²/n) · √(p(1−p)/n + z²/4n²).
        double p = (double)successes / n, z2n = z * z / n;
        var denominator = 1 + z2n;
        var centre = (p + z2n / 2) / denominator;
        var half = z / denominator * Math.Sqrt(p * (1 - p) / n + z2n / (4 * n));
        // At 0 and at n the exact ends are 0 and 1; rounding in the last digit must not report 1e-17 or 0.9999999999999999.
        var low = successes == 0 ? 0 : Math.Max(0, centre - half);
        var high = successes == n ? 1 : Math.Min(1, centre + half);
        return new ProportionInterval(p, low, high);
    }
}
