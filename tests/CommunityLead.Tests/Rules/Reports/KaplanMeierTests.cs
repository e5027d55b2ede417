using CommunityLead.Rules.Reports;
using MathNet.Numerics.Statistics;

namespace CommunityLead.Tests.Rules.Reports;

// Kaplan–Meier for left-censored data (Helsel 2005, Nondetects and Data Analysis; EPA Unified Guidance 2009 ch. 15)
// [published]. Convention: the p-quantile is the smallest measured value whose estimated share at or below it is ≥ p.
public class KaplanMeierTests
{
    private static CensoredValue Nd(double limit) => new(limit, BelowLimit: true);
    private static CensoredValue At(double value) => new(value, BelowLimit: false);

    // DOMAIN.md §7 illustration: <1, <1, 2, 3, 5 → median 2 [published: Helsel].
    // By hand, from the top: at 5, 5 at risk → share below 4/5; at 3, 4 at risk → 4/5 · 3/4 = 3/5 below 3;
    // at 2, 3 at risk (2, <1, <1) → 3/5 · 2/3 = 2/5 below 2. So F(2) = 0.6 ≥ 0.5 and the median is 2; F(3) = 0.8 ≥ 0.75.
    [Fact]
    public void Quantile_HelselIllustration_MedianIsTwo()
    {
        CensoredValue[] values = [Nd(1), Nd(1), At(2), At(3), At(5)];
        Assert.Equal(new KaplanMeierQuantile(2, false), KaplanMeier.Quantile(values, 0.5));
        Assert.Equal(new KaplanMeierQuantile(3, false), KaplanMeier.Quantile(values, 0.75));
        // 25th: 0.25 ≤ 2/5 lies below the lowest result, among the two <1: "below 1".
        Assert.Equal(new KaplanMeierQuantile(1, true), KaplanMeier.Quantile(values, 0.25));
    }

    // Several limits, worked by hand (µg/L): <1, <1, <2, 1.5, <5, 3, 4, 6, 8, <10.
    // From the top, "at risk" at a result = results and limits at or below it (the <10 is never at risk: its weight
    // spreads over everything below 10):
    //   at 8:   9 at risk (1.5, 3, 4, 6, 8, <1, <1, <2, <5) → F(8) = 1,         below 8/9
    //   at 6:   8 at risk                                    → F(6) = 8/9,       below 8/9 · 7/8 = 7/9
    //   at 4:   6 at risk (1.5, 3, 4, <1, <1, <2; <5 is not)  → F(4) = 7/9 = .778, below 7/9 · 5/6 = 35/54
    //   at 3:   5 at risk                                    → F(3) = 35/54 = .648, below 35/54 · 4/5 = 14/27
    //   at 1.5: 3 at risk (1.5, <1, <1)                       → F(1.5) = 14/27 = .519, below 14/27 · 2/3 = 28/81 = .346
    // Median: F(1.5) = .519 ≥ .5 → 1.5. 75th: F(3) = .648 < .75 ≤ F(4) → 4. 90th: F(6) = .889 < .9 → 8.
    // 25th: .25 ≤ .346, among the non-detects at or below 1.5, the highest of which is <1 → "below 1".
    // For contrast, half the limits (0.5, 0.5, 1, 1.5, 2.5, 3, 4, 5, 6, 8) would give a median of 2.5 (ranks 5 and 6
    // averaged is 2.75): substitution invents values, which is why DOMAIN.md §7 forbids it.
    [Theory]
    [InlineData(0.5, 1.5, false)]
    [InlineData(0.75, 4, false)]
    [InlineData(0.9, 8, false)]
    [InlineData(1.0, 8, false)]
    [InlineData(0.25, 1, true)]
    [InlineData(0.1, 1, true)]
    public void Quantile_SeveralLimits_MatchesHandWork(double p, double value, bool upperBound)
    {
        CensoredValue[] values = [Nd(1), Nd(10), Nd(2), At(1.5), Nd(5), At(3), At(4), At(6), At(8), Nd(1)];
        Assert.Equal(new KaplanMeierQuantile(value, upperBound), KaplanMeier.Quantile(values, p));
    }

    // All non-detects: nothing anchors the estimate. Each value is under its limit, so the median of the limits
    // (1, 1, 5 → 1) bounds the median from above.
    [Fact]
    public void Quantile_AllCensored_IsUpperBound()
    {
        Assert.Equal(new KaplanMeierQuantile(1, true), KaplanMeier.Quantile([Nd(5), Nd(1), Nd(1)], 0.5));
        Assert.Equal(new KaplanMeierQuantile(5, true), KaplanMeier.Quantile([Nd(5), Nd(1), Nd(1)], 0.9));
    }

    // A non-detect tied with a result counts below it (Helsel): <2, 2, 3 → at 2, 2 at risk, F just below 2 is 1/3.
    [Fact]
    public void Quantile_LimitTiedWithResult_LimitCountsBelow()
    {
        CensoredValue[] values = [Nd(2), At(2), At(3)];
        Assert.Equal(new KaplanMeierQuantile(2, false), KaplanMeier.Quantile(values, 0.5));
        Assert.Equal(new KaplanMeierQuantile(2, true), KaplanMeier.Quantile(values, 0.3));
    }

    // No non-detects: KM is the empirical distribution, so the quantile is the result at rank ⌈p·n⌉, checked
    // against MathNet's Hyndman–Fan type 1 (inverse of the empirical distribution function).
    [Fact]
    public void Quantile_NoCensoring_IsEmpiricalInverse()
    {
        var random = new Random(7);
        for (var n = 1; n <= 60; n++)
        {
            var data = Enumerable.Range(0, n).Select(_ => (double)random.Next(0, 25)).ToArray();
            foreach (var p in new[] { 0.1, 0.25, 0.5, 0.75, 0.9, 1.0 })
            {
                var km = KaplanMeier.Quantile([.. data.Select(At)], p)!;
                Assert.False(km.IsUpperBound);
                Assert.Equal(data.QuantileCustom(p, QuantileDefinition.R1), km.Value);
            }
        }
    }

    // Independent route: Efron's (1967) redistribute-to-the-right construction on the flipped data gives the same
    // estimate as the product-limit formula. Random data with ties and several limits.
    [Fact]
    public void Quantile_RandomData_MatchesRedistributeToTheRight()
    {
        var random = new Random(15);
        for (var trial = 0; trial < 400; trial++)
        {
            var values = Enumerable.Range(0, random.Next(1, 30))
                .Select(_ => new CensoredValue(random.Next(1, 12) / 2.0, random.NextDouble() < 0.4)).ToArray();
            foreach (var p in new[] { 0.1, 0.25, 0.5, 0.75, 0.9 })
                Assert.Equal(RedistributeToTheRight.Quantile(values, p), KaplanMeier.Quantile(values, p));
        }
    }

    [Fact]
    public void Quantile_NoValues_IsNull() => Assert.Null(KaplanMeier.Quantile([], 0.5));

    [Theory]
    [InlineData(0.0)]
    [InlineData(-0.1)]
    [InlineData(1.01)]
    [InlineData(double.NaN)]
    public void Quantile_BadP_Throws(double p) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => KaplanMeier.Quantile([At(1)], p));

    [Fact]
    public void Quantile_InfiniteValue_Throws() =>
        Assert.Throws<ArgumentException>(() => KaplanMeier.Quantile([At(1), Nd(double.PositiveInfinity)], 0.5));
}
