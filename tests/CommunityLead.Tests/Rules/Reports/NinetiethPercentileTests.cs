using CommunityLead.Rules.Reports;
using MathNet.Numerics.Statistics;

namespace CommunityLead.Tests.Rules.Reports;

// 90th percentile by 40 CFR 141.80(c)(3) [published]; worked examples from ../shared/DOMAIN.md §2.
public class NinetiethPercentileTests
{
    private static readonly NinetiethRounding[] AllRules = Enum.GetValues<NinetiethRounding>();

    // Result at rank k is k² / 10, given highest first so the rule must rank them itself.
    private static double[] Squares(int n) => [.. Enumerable.Range(1, n).Select(k => k * k / 10.0).Reverse()];

    // [published, state guidance sheets via DOMAIN.md §2]: (0.011 + 0.020) / 2 = 0.0155; (0.012 + 0.026) / 2 = 0.019.
    [Theory]
    [InlineData(new[] { 0.008, 0.008, 0.008, 0.011, 0.020 }, 0.0155)]
    [InlineData(new[] { 0.001, 0.003, 0.005, 0.012, 0.026 }, 0.019)]
    [InlineData(new[] { 0.020, 0.008, 0.011, 0.008, 0.008 }, 0.0155)]
    public void Compute_FiveSamples_MeanOfTwoHighest(double[] values, double expected)
    {
        foreach (var rule in AllRules)
        {
            var result = NinetiethPercentile.Compute(values, rule)!;
            Assert.Equal(expected, result.Value, 12);
            Assert.Equal(5, result.SampleCount);
            Assert.Contains("mean of the two highest", result.Method);
        }
    }

    // Without the 5-sample rule, 0.9 · 5 = 4.5 goes through the rounding rule: ranks 4, 5 of 0.1, 0.4, 0.9, 1.6, 2.5.
    [Theory]
    [InlineData(NinetiethRounding.RoundHalfUp, 2.5)]
    [InlineData(NinetiethRounding.RoundHalfToEven, 1.6)]
    [InlineData(NinetiethRounding.RoundUp, 2.5)]
    [InlineData(NinetiethRounding.Interpolate, 2.05)]
    public void Compute_FiveSamplesRuleOff_UsesRankRule(NinetiethRounding rule, double expected) =>
        Assert.Equal(expected, NinetiethPercentile.Compute(Squares(5), rule, fiveSampleRule: false)!.Value, 12);

    // 20 samples → the 18th ranked; 60 → the 54th [published, state guidance sheets via DOMAIN.md §2];
    // 10 → the 9th. A whole 0.9·n has one answer whatever the rounding setting.
    [Theory]
    [InlineData(10, 9)]
    [InlineData(20, 18)]
    [InlineData(60, 54)]
    [InlineData(1000, 900)]
    public void Compute_WholeRank_IsThatRankedResult(int n, int rank)
    {
        foreach (var rule in AllRules)
        {
            var result = NinetiethPercentile.Compute(Squares(n), rule)!;
            Assert.Equal(rank * rank / 10.0, result.Value);
            Assert.Equal(n, result.SampleCount);
            Assert.StartsWith($"the {rank}th of {n} ranked results", result.Method);
        }
    }

    // Non-whole 0.9·n has no federal rule (DOMAIN.md §2); ranks worked by hand, results k²/10:
    // n = 12 → 10.8: nearest 11 either way, up 11; interpolated 10.0 + 0.8 · (12.1 − 10.0) = 11.68.
    // n = 15 → 13.5: half up 14; half to even 14 too (13 is odd); up 14; interpolated 16.9 + 0.5 · (19.6 − 16.9) = 18.25.
    // n = 25 → 22.5: half up 23; half to even 22 (22 is even): the case where the two differ; interpolated
    //   48.4 + 0.5 · (52.9 − 48.4) = 50.65.
    // n = 16 → 14.4: nearest 14 either way, up 15; interpolated 19.6 + 0.4 · (22.5 − 19.6) = 20.76.
    // n = 45 → 40.5: half up 41, half to even 40; interpolated 160 + 0.5 · (168.1 − 160) = 164.05.
    [Theory]
    [InlineData(12, NinetiethRounding.RoundHalfUp, 12.1)]
    [InlineData(12, NinetiethRounding.RoundHalfToEven, 12.1)]
    [InlineData(12, NinetiethRounding.RoundUp, 12.1)]
    [InlineData(12, NinetiethRounding.Interpolate, 11.68)]
    [InlineData(15, NinetiethRounding.RoundHalfUp, 19.6)]
    [InlineData(15, NinetiethRounding.RoundHalfToEven, 19.6)]
    [InlineData(15, NinetiethRounding.RoundUp, 19.6)]
    [InlineData(15, NinetiethRounding.Interpolate, 18.25)]
    [InlineData(25, NinetiethRounding.RoundHalfUp, 52.9)]
    [InlineData(25, NinetiethRounding.RoundHalfToEven, 48.4)]
    [InlineData(25, NinetiethRounding.RoundUp, 52.9)]
    [InlineData(25, NinetiethRounding.Interpolate, 50.65)]
    [InlineData(16, NinetiethRounding.RoundHalfUp, 19.6)]
    [InlineData(16, NinetiethRounding.RoundHalfToEven, 19.6)]
    [InlineData(16, NinetiethRounding.RoundUp, 22.5)]
    [InlineData(16, NinetiethRounding.Interpolate, 20.76)]
    [InlineData(45, NinetiethRounding.RoundHalfUp, 168.1)]
    [InlineData(45, NinetiethRounding.RoundHalfToEven, 160.0)]
    [InlineData(45, NinetiethRounding.Interpolate, 164.05)]
    public void Compute_NonWholeRank_FollowsRoundingRule(int n, NinetiethRounding rule, double expected) =>
        Assert.Equal(expected, NinetiethPercentile.Compute(Squares(n), rule)!.Value, 9);

    [Theory]
    [InlineData(NinetiethRounding.RoundHalfUp, "the 23rd of 25 ranked results (0.9 × 25 = 22.5; not whole, so rounded to the nearest rank, halves up)")]
    [InlineData(NinetiethRounding.RoundHalfToEven, "the 22nd of 25 ranked results (0.9 × 25 = 22.5; not whole, so rounded to the nearest rank, halves to even)")]
    [InlineData(NinetiethRounding.RoundUp, "the 23rd of 25 ranked results (0.9 × 25 = 22.5; not whole, so rounded up)")]
    [InlineData(NinetiethRounding.Interpolate, "50 % of the way from the 22nd to the 23rd of 25 ranked results (0.9 × 25 = 22.5; not whole, so interpolated)")]
    public void Compute_NonWholeRank_MethodSaysWhichRule(NinetiethRounding rule, string method) =>
        Assert.Equal(method, NinetiethPercentile.Compute(Squares(25), rule)!.Method);

    // Independent check with MathNet's Hyndman–Fan definitions at 0.9: round up is type 1 (inverse of the empirical
    // distribution, x at rank ⌈0.9·n⌉), interpolation is type 4 (h = 0.9·n, linear between floor and ceiling ranks),
    // half to even is type 3 (nearest rank, ties to even).
    [Theory]
    [InlineData(NinetiethRounding.RoundUp, QuantileDefinition.R1)]
    [InlineData(NinetiethRounding.RoundHalfToEven, QuantileDefinition.R3)]
    [InlineData(NinetiethRounding.Interpolate, QuantileDefinition.R4)]
    public void Compute_SixToHundredSamples_MatchesHyndmanFan(NinetiethRounding rule, QuantileDefinition definition)
    {
        var random = new Random(6);
        for (var n = 6; n <= 100; n++)
        {
            var values = Enumerable.Range(0, n).Select(_ => Math.Round(random.NextDouble() * 30, 1)).ToArray();
            Assert.Equal(values.QuantileCustom(0.9, definition), NinetiethPercentile.Compute(values, rule)!.Value, 9);
        }
    }

    // Fewer than 5 samples: the highest (DOMAIN.md §2) [from memory].
    [Theory]
    [InlineData(new[] { 0.004 })]
    [InlineData(new[] { 0.004, 0.017 })]
    [InlineData(new[] { 0.017, 0.004, 0.002, 0.009 })]
    public void Compute_FewerThanFive_IsTheHighest(double[] values)
    {
        foreach (var rule in AllRules)
        {
            var result = NinetiethPercentile.Compute(values, rule)!;
            Assert.Equal(values.Max(), result.Value);
            Assert.Equal(values.Length, result.SampleCount);
            Assert.Contains("the highest", result.Method);
        }
    }

    [Fact]
    public void Compute_NoValues_IsNull() => Assert.Null(NinetiethPercentile.Compute([], NinetiethPercentile.DefaultRounding));

    // The default never reports less than any other rule: ranks ascend, and it takes the higher neighbour.
    [Fact]
    public void DefaultRounding_IsNeverBelowTheOtherRules()
    {
        for (var n = 6; n <= 60; n++)
        {
            var chosen = NinetiethPercentile.Compute(Squares(n), NinetiethPercentile.DefaultRounding)!.Value;
            Assert.All(AllRules, rule => Assert.True(chosen >= NinetiethPercentile.Compute(Squares(n), rule)!.Value));
        }
    }

    [Fact]
    public void Compute_NotANumber_Throws() =>
        Assert.Throws<ArgumentException>(() => NinetiethPercentile.Compute([0.001, double.NaN], NinetiethRounding.RoundUp));
}
