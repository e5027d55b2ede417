using CommunityLead.Rules.Reports;
using MathNet.Numerics.Distributions;

namespace CommunityLead.Tests.Rules.Reports;

// Wilson score interval (Wilson 1927, JASA 22:209) [published formula].
public class WilsonScoreTests
{
    // 10 of 100 by hand: z² = 3.8415, z²/n = 0.038415; centre = (0.1 + 0.019207) / 1.038415 = 0.114798;
    // half = 1.959964 / 1.038415 · √(0.0009 + 0.00009604) = 1.887456 · 0.031560 = 0.059569 → (0.0552, 0.1744).
    // 0 of 10: high = z² / (n + z²) = 3.8415 / 13.8415 = 0.2775; 10 of 10 mirrors it.
    // 81 of 263 → (0.2553, 0.3662) and 15 of 148 → (0.0624, 0.1605): Newcombe 1998, Statistics in Medicine 17:857,
    // Table I, Wilson score method [from memory; the same figures also worked by hand here].
    [Theory]
    [InlineData(10, 100, 0.0552, 0.1744)]
    [InlineData(0, 10, 0.0, 0.2775)]
    [InlineData(10, 10, 0.7225, 1.0)]
    [InlineData(81, 263, 0.2553, 0.3662)]
    [InlineData(15, 148, 0.0624, 0.1605)]
    public void Interval_TextbookCases_MatchToFourDecimals(int successes, int n, double low, double high)
    {
        var interval = WilsonScore.Interval(successes, n)!;
        Assert.Equal((double)successes / n, interval.Proportion);
        Assert.Equal(low, interval.Low, 4);
        Assert.Equal(high, interval.High, 4);
    }

    [Fact]
    public void Interval_AllOrNone_EndsAreExactlyZeroAndOne()
    {
        Assert.Equal(0.0, WilsonScore.Interval(0, 7)!.Low);
        Assert.Equal(1.0, WilsonScore.Interval(7, 7)!.High);
    }

    [Fact]
    public void Interval_NoSamples_IsNull() => Assert.Null(WilsonScore.Interval(0, 0));

    // The default z is Φ⁻¹(0.975), here from MathNet's normal quantile.
    [Fact]
    public void Z95_IsTheNormalQuantile() => Assert.Equal(WilsonScore.Z95, Normal.InvCDF(0, 1, 0.975), 14);

    // Independent route: the Wilson ends are the roots of (p̂ − p)² = z²·p(1 − p)/n, a quadratic in p.
    [Theory]
    [InlineData(1, 3, 0.975)]
    [InlineData(4, 17, 0.975)]
    [InlineData(37, 40, 0.975)]
    [InlineData(250, 1000, 0.975)]
    [InlineData(3, 12, 0.995)]
    [InlineData(12, 12, 0.95)]
    public void Interval_MatchesQuadraticRoots(int successes, int n, double normalQuantile)
    {
        var z = Normal.InvCDF(0, 1, normalQuantile);
        double p = (double)successes / n, k = z * z / n;
        double a = 1 + k, b = -(2 * p + k), c = p * p;
        var root = Math.Sqrt(b * b - 4 * a * c);
        var interval = WilsonScore.Interval(successes, n, z)!;
        Assert.Equal((-b - root) / (2 * a), interval.Low, 12);
        Assert.Equal((-b + root) / (2 * a), interval.High, 12);
    }

    [Fact]
    public void Interval_HigherConfidence_IsWider()
    {
        var ninetyFive = WilsonScore.Interval(10, 100)!;
        var ninetyNine = WilsonScore.Interval(10, 100, Normal.InvCDF(0, 1, 0.995))!;
        Assert.True(ninetyNine.Low < ninetyFive.Low && ninetyNine.High > ninetyFive.High);
    }

    [Theory]
    [InlineData(-1, 10, WilsonScore.Z95)]
    [InlineData(11, 10, WilsonScore.Z95)]
    [InlineData(0, -1, WilsonScore.Z95)]
    [InlineData(1, 10, 0.0)]
    [InlineData(1, 10, double.NaN)]
    public void Interval_BadInput_Throws(int successes, int n, double z) =>
        Assert.Throws<ArgumentOutOfRangeException>(() => WilsonScore.Interval(successes, n, z));
}
