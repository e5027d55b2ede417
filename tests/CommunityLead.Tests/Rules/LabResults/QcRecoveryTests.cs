using CommunityLead.Rules.LabResults;
using static CommunityLead.Tests.Rules.LabResults.Qc;

namespace CommunityLead.Tests.Rules.LabResults;

/// <summary>Recovery windows are inclusive: a result exactly on an edge passes.</summary>
public class QcRecoveryTests
{
    // Calibration check ±10% [memory: EPA Methods 200.7/200.8; a setting].
    // 10.3 / 10.0 · 100 = 103.0% → inside 90–110%.
    [Fact]
    public void CalibrationCheck_103Percent_Passes()
    {
        var check = Single(CalibrationCheck(10.0, 10.3));
        Assert.True(check.Passed);
        Assert.Equal("recovery %", check.Figure);
        Assert.Equal(103.0, check.Value!.Value, 9);
        Assert.Equal((90.0, 110.0), (check.Low, check.High));
        Assert.Equal("103.0% recovery, window 90–110%", check.Detail);
    }

    // 8.9 / 10.0 · 100 = 89.0% → below 90%.
    [Fact]
    public void CalibrationCheck_89Percent_Fails()
    {
        var check = Single(CalibrationCheck(10.0, 8.9));
        Assert.False(check.Passed);
        Assert.Equal(89.0, check.Value!.Value, 9);
        Assert.Equal("89.0% recovery, outside the window 90–110%", check.Detail);
    }

    // 9.0 / 10.0 = 90% and 11.0 / 10.0 = 110% exactly on paper (in binary the latter is 110.00000000000001).
    [Theory]
    [InlineData(9.0)]
    [InlineData(11.0)]
    public void CalibrationCheck_ExactlyOnWindowEdge_Passes(double measured) =>
        Assert.True(Single(CalibrationCheck(10.0, measured)).Passed);

    [Theory]
    [InlineData(8.999)]
    [InlineData(11.001)]
    public void CalibrationCheck_JustOutsideWindowEdge_Fails(double measured) =>
        Assert.False(Single(CalibrationCheck(10.0, measured)).Passed);

    [Fact]
    public void CalibrationCheck_CustomWindow_IsUsed()
    {
        var windows = new QcWindows { CalibrationCheckLowPercent = 95, CalibrationCheckHighPercent = 105 };
        var verdict = QcEvaluator.Evaluate([CalibrationCheck(10.0, 9.4)], new Dictionary<Analyte, int>(), LeadLimit(1), windows);
        Assert.False(verdict.Passed);
        Assert.Equal((95.0, 105.0), (verdict.Checks[0].Low, verdict.Checks[0].High));
    }

    // Laboratory fortified blank 85–115% [published: EPA Method 200.8 §9.3.2].
    // 17.2 / 20 · 100 = 86% → pass; 16.8 / 20 · 100 = 84% → fail.
    [Fact]
    public void FortifiedBlank_86Percent_Passes()
    {
        var check = Single(FortifiedBlank(20, 17.2));
        Assert.True(check.Passed);
        Assert.Equal(86.0, check.Value!.Value, 9);
        Assert.Equal((85.0, 115.0), (check.Low, check.High));
        Assert.Equal("86.0% recovery, window 85–115%", check.Detail);
    }

    [Fact]
    public void FortifiedBlank_84Percent_Fails()
    {
        var check = Single(FortifiedBlank(20, 16.8));
        Assert.False(check.Passed);
        Assert.Equal(84.0, check.Value!.Value, 9);
    }

    // Matrix spike 70–130% [memory: EPA Methods 200.7/200.8; a setting]. Recovery counts only what the spike added:
    // (12.1 − 4.0) / 10.0 · 100 = 81% → pass; (10.5 − 4.0) / 10.0 · 100 = 65% → fail.
    [Fact]
    public void MatrixSpike_81Percent_Passes()
    {
        var check = Single(MatrixSpike(unspiked: 4.0, added: 10.0, measured: 12.1));
        Assert.True(check.Passed);
        Assert.Equal(81.0, check.Value!.Value, 9);
        Assert.Equal((70.0, 130.0), (check.Low, check.High));
        Assert.Equal("81.0% recovery, window 70–130%", check.Detail);
    }

    [Fact]
    public void MatrixSpike_65Percent_Fails()
    {
        var check = Single(MatrixSpike(unspiked: 4.0, added: 10.0, measured: 10.5));
        Assert.False(check.Passed);
        Assert.Equal(65.0, check.Value!.Value, 9);
    }

    [Fact]
    public void CalibrationCheck_NoMeasuredValue_FailsSayingSo()
    {
        var check = Single(CalibrationCheck(10.0, null));
        Assert.False(check.Passed);
        Assert.Null(check.Value);
        Assert.Equal("Cannot be checked: a measured value is missing", check.Detail);
    }

    [Theory]
    [InlineData(null)]
    [InlineData(0.0)]
    [InlineData(-5.0)]
    public void CalibrationCheck_NoPositiveExpected_FailsSayingSo(double? expected)
    {
        var check = Single(CalibrationCheck(expected, 10.0));
        Assert.False(check.Passed);
        Assert.Null(check.Value);
        Assert.Contains("expected value above zero", check.Detail);
    }

    [Fact]
    public void FortifiedBlank_NothingGiven_NamesBothMissingValues()
    {
        var check = Single(FortifiedBlank(null, double.NaN));
        Assert.False(check.Passed);
        Assert.Equal("Cannot be checked: a measured value and an expected (spiked) amount above zero are missing", check.Detail);
    }

    [Fact]
    public void MatrixSpike_NothingGiven_NamesAllThreeMissingValues()
    {
        var check = Single(MatrixSpike(null, 0, null));
        Assert.False(check.Passed);
        Assert.Null(check.Value);
        Assert.Equal("Cannot be checked: a measured value, the unspiked result and a spike amount above zero are missing", check.Detail);
    }
}
