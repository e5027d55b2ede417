using CommunityLead.Rules.LabResults;
using static CommunityLead.Tests.Rules.LabResults.Qc;

namespace CommunityLead.Tests.Rules.LabResults;

public class QcDuplicateAndBlankTests
{
    // Duplicate RPD ≤ 20% [practice]. RPD = |a − b| / ((a + b) / 2) · 100.
    // 12.0 and 10.0: 2 / 11 · 100 = 18.18% → pass.
    [Fact]
    public void Duplicate_Rpd18Percent_Passes()
    {
        var check = Single(Duplicate(12.0, 10.0));
        Assert.True(check.Passed);
        Assert.Equal("RPD %", check.Figure);
        Assert.Equal(18.18, check.Value!.Value, 2);
        Assert.Null(check.Low);
        Assert.Equal(20.0, check.High);
        Assert.Equal("RPD 18.2% between 12 and 10, limit 20%", check.Detail);
    }

    // 12.0 and 9.5: 2.5 / 10.75 · 100 = 23.26% → fail.
    [Fact]
    public void Duplicate_Rpd23Percent_Fails()
    {
        var check = Single(Duplicate(12.0, 9.5));
        Assert.False(check.Passed);
        Assert.Equal(23.26, check.Value!.Value, 2);
        Assert.Equal("RPD 23.3% between 12 and 9.5, over the limit of 20%", check.Detail);
    }

    // [practice] RPD is meaningless near the reporting limit: 0.4 and 0.8 µg/L differ by 67% RPD yet agree within noise.
    [Theory]
    [InlineData(0.4, 0.8)]
    [InlineData(0.8, 5.0)]
    [InlineData(5.0, 0.99)]
    public void Duplicate_EitherBelowReportingLimit_IsNotEvaluatedAndPasses(double a, double b)
    {
        var check = Single(Duplicate(a, b), leadReportingLimit: 1.0);
        Assert.True(check.Passed);
        Assert.Null(check.Value);
        Assert.StartsWith("Not evaluated:", check.Detail);
        Assert.Contains("below the reporting limit 1", check.Detail);
    }

    [Fact]
    public void Duplicate_AtReportingLimit_IsEvaluated()
    {
        // 1.0 and 2.0: 1 / 1.5 · 100 = 66.7% → evaluated, fails.
        var check = Single(Duplicate(1.0, 2.0), leadReportingLimit: 1.0);
        Assert.False(check.Passed);
        Assert.Equal(66.67, check.Value!.Value, 2);
    }

    [Fact]
    public void Duplicate_BothZeroWithoutReportingLimit_IsNotEvaluated()
    {
        var check = Single(Duplicate(0, 0), leadReportingLimit: null);
        Assert.True(check.Passed);
        Assert.Null(check.Value);
        Assert.StartsWith("Not evaluated:", check.Detail);
    }

    [Fact]
    public void Duplicate_MissingDuplicateValue_Fails()
    {
        var check = Single(Duplicate(12.0, null));
        Assert.False(check.Passed);
        Assert.Equal("Cannot be checked: a duplicate value is missing", check.Detail);
    }

    // Calibration blank below the reporting limit [practice]: 0.02 < 1.0 → pass; 1.2 ≥ 1.0 → fail.
    [Fact]
    public void Blank_BelowReportingLimit_Passes()
    {
        var check = Single(Blank(0.02), leadReportingLimit: 1.0);
        Assert.True(check.Passed);
        Assert.Equal("blank vs reporting limit", check.Figure);
        Assert.Equal(0.02, check.Value);
        Assert.Equal(1.0, check.High);
        Assert.Equal("Blank read 0.02, below the reporting limit 1", check.Detail);
    }

    [Theory]
    [InlineData(1.2)]
    [InlineData(1.0)]
    public void Blank_AtOrAboveReportingLimit_Fails(double measured)
    {
        var check = Single(Blank(measured), leadReportingLimit: 1.0);
        Assert.False(check.Passed);
        Assert.Equal(measured, check.Value);
        Assert.Contains("at or above the reporting limit 1", check.Detail);
    }

    [Fact]
    public void Blank_NoReportingLimitForAnalyte_FailsSayingSo()
    {
        // The batch knows a lead RL only; the copper blank has nothing to be compared with.
        var check = Single(Blank(0.001, Analyte.Copper), leadReportingLimit: 1.0);
        Assert.False(check.Passed);
        Assert.Null(check.High);
        Assert.Equal("Cannot be checked: no reporting limit is known for copper in this batch", check.Detail);
    }

    [Fact]
    public void Blank_NoMeasuredValue_Fails() => Assert.False(Single(Blank(null)).Passed);
}
