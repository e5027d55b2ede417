using CommunityLead.Rules.LabResults;

namespace CommunityLead.Tests.Rules.LabResults;

// MDL per 40 CFR 136 Appendix B, Revision 2 [published definition; procedure details memory].
public class MethodDetectionLimitTests
{
    private static readonly double[] Berthouex = [2.5, 2.7, 2.2, 2.2, 3.1, 2.6, 2.8];

    // One-sided 99% Student t [published: Wisconsin NR 252 table, quoted in DOMAIN.md §4].
    [Theory]
    [InlineData(7, 3.143)]
    [InlineData(8, 2.998)]
    [InlineData(9, 2.896)]
    [InlineData(10, 2.821)]
    [InlineData(11, 2.764)]
    [InlineData(16, 2.602)]
    [InlineData(21, 2.528)]
    [InlineData(31, 2.457)]
    public void T_OneSided99Percent_MatchesPublishedTable(int replicates, double expected)
    {
        Assert.Equal(expected, MethodDetectionLimit.OneSidedT(replicates - 1), 3);
        var spiked = Enumerable.Range(0, replicates).Select(i => 1.0 + i % 3 * 0.1).ToArray();
        var result = MethodDetectionLimit.Compute(spiked, []);
        Assert.Equal(expected, result.T, 3);
        Assert.Equal(replicates, result.N);
    }

    // Berthouex & Brown, Statistics for Environmental Engineers (2002), Ex. 14.1 [published]: s = 0.32, MDL ≈ 1.0.
    // Worked out: sum 18.1, mean 2.5857; squared deviations sum to 0.62857; s² = 0.62857 / 6 = 0.10476;
    // s = 0.32367; MDL = t(6, 0.99) · s = 3.14267 · 0.32367 = 1.0172.
    [Fact]
    public void Compute_BerthouexExample_IsAboutOne()
    {
        var result = MethodDetectionLimit.Compute(Berthouex, []);
        Assert.Equal(0.32, Math.Round(result.MdlSpiked / result.T, 2));
        Assert.InRange(result.MdlSpiked, 0.95, 1.05);
        Assert.Equal(1.0172, result.MdlSpiked, 3);
        Assert.Equal(result.MdlSpiked, result.Mdl);
        Assert.Equal(7, result.N);
    }

    [Fact]
    public void Compute_NoBlanks_MdlBlankIsNull() => Assert.Null(MethodDetectionLimit.Compute(Berthouex, []).MdlBlank);

    // Blanks 0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1: mean 0.8, s = √(0.28 / 6) = 0.21602; MDL_b = 0.8 + 3.14267 · 0.21602
    // = 1.4789, above MDL_s = 1.0172, so the blanks set the MDL.
    [Fact]
    public void Compute_BlanksWiderThanSpikes_MdlIsMdlBlank()
    {
        var result = MethodDetectionLimit.Compute(Berthouex, [0.5, 0.6, 0.7, 0.8, 0.9, 1.0, 1.1]);
        Assert.Equal(1.4789, result.MdlBlank!.Value, 3);
        Assert.Equal(result.MdlBlank.Value, result.Mdl);
        Assert.True(result.Mdl > result.MdlSpiked);
    }

    [Fact]
    public void Compute_QuietBlanks_MdlIsMdlSpiked()
    {
        var result = MethodDetectionLimit.Compute(Berthouex, [0.01, 0.02, 0.0, 0.01, 0.03, 0.02, 0.01]);
        Assert.True(result.MdlBlank < result.MdlSpiked);
        Assert.Equal(result.MdlSpiked, result.Mdl);
    }

    // Appendix B: a negative blank mean is taken as zero; only the spread counts.
    // Blanks −0.3 … +0.3 step 0.1: mean 0, s = √(0.28 / 6) = 0.21602; MDL_b = 3.14267 · 0.21602 = 0.6789.
    // Shifted down by 0.1 the mean is −0.1 → 0 and s is unchanged, so MDL_b is the same.
    [Fact]
    public void Compute_NegativeBlankMean_TakenAsZero()
    {
        double[] centred = [-0.3, -0.2, -0.1, 0.0, 0.1, 0.2, 0.3];
        var atZero = MethodDetectionLimit.Compute(Berthouex, centred).MdlBlank!.Value;
        var belowZero = MethodDetectionLimit.Compute(Berthouex, [.. centred.Select(b => b - 0.1)]).MdlBlank!.Value;
        Assert.Equal(0.6789, atZero, 3);
        Assert.Equal(atZero, belowZero, 9);
    }

    [Fact]
    public void Compute_EqualBlanks_MdlBlankIsTheirValue()
    {
        Assert.Equal(0.4, MethodDetectionLimit.Compute(Berthouex, [0.4, 0.4, 0.4, 0.4, 0.4, 0.4, 0.4]).MdlBlank!.Value, 12);
        Assert.Equal(0, MethodDetectionLimit.Compute(Berthouex, [-0.2, -0.2, -0.2, -0.2, -0.2, -0.2, -0.2]).MdlBlank);
    }

    // From 100 blanks on, MDL_b is the ranked blank at 0.99·n rounded to nearest (Appendix B's example, from memory:
    // 164 blanks → 162.36 → the 162nd).
    [Theory]
    [InlineData(100, 99)]   // 99.0 → 99th
    [InlineData(164, 162)]  // 162.36 → 162nd
    [InlineData(150, 149)]  // 148.5 → 149th, halves up
    [InlineData(250, 248)]  // 247.5 → 248th
    public void Compute_HundredOrMoreBlanks_UsesRankedNinetyNinthPercentile(int count, int rank)
    {
        // Blank of rank i reads i / 1000; given highest first, so the rule must rank them itself.
        var blanks = Enumerable.Range(1, count).Select(i => i / 1000.0).Reverse().ToArray();
        Assert.Equal(rank / 1000.0, MethodDetectionLimit.Compute(Berthouex, blanks).MdlBlank);
    }

    [Fact]
    public void Compute_NinetyNineBlanks_StillUsesMeanAndSpread()
    {
        var blanks = Enumerable.Range(1, 99).Select(i => i / 1000.0).ToArray();
        // Mean 0.05; the ranked rule would give at most the largest blank, 0.099; mean + t·s is above it.
        Assert.True(MethodDetectionLimit.Compute(Berthouex, blanks).MdlBlank > 0.099);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(6)]
    public void Compute_FewerThanSevenSpiked_Throws(int count)
    {
        var ex = Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(Berthouex[..count], []));
        Assert.Equal("spiked", ex.ParamName);
        Assert.Contains("at least 7 spiked replicates", ex.Message);
    }

    [Fact]
    public void Compute_OneToSixBlanks_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(Berthouex, [0.1, 0.2, 0.3]));
        Assert.Equal("blanks", ex.ParamName);
        Assert.Contains("at least 7 method blanks", ex.Message);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void Compute_NonFiniteValue_Throws(double bad)
    {
        Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute([.. Berthouex[..6], bad], []));
        Assert.Throws<ArgumentException>(() => MethodDetectionLimit.Compute(Berthouex, [0.1, 0.1, 0.1, bad, 0.1, 0.1, 0.1]));
    }
}
