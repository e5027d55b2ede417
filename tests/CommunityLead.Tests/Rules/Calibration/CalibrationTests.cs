using CommunityLead.Rules.Calibration;

namespace CommunityLead.Tests.Rules.Calibration;

public class CalibrationTests
{
    [Fact]
    public void Build_WorkedBackCalculation_ReadsEachStandardThroughTheLine()
    {
        // Worked by hand: standards 0, 10, 20 µg/L read 100, 1100, 2000 counts (means). Unweighted fit over the means:
        // x̄ = 10, ȳ = 1066.67, Sxx = 200, Sxy = 0·… → slope = (−10·−966.67 + 0 + 10·933.33)/200 = 95, intercept = 116.67.
        // The 10 µg/L standard reads back (1100 − 116.67)/95 = 10.351 µg/L: 103.51 % of nominal.
        var calibration = CalibrationCurve.Build(
            [new(0, [99, 100, 101]), new(10, [1_090, 1_100, 1_110]), new(20, [2_000, 2_000, 2_000])], new CalibrationModel());

        Assert.Equal(95, calibration.Fit.Slope, 10);
        Assert.Equal(116.666666667, calibration.Fit.Intercept, 6);
        Assert.Equal(10.350877193, calibration.Standards[1].Found, 6);
        Assert.Equal(103.50877193, calibration.Standards[1].RecoveryPercent!.Value, 6);
        Assert.Null(calibration.Standards[0].RecoveryPercent);
        Assert.Equal(20, calibration.Highest);
        Assert.Equal(10, calibration.LowestAboveBlank);
    }

    [Fact]
    public void Build_ThroughTheBlank_FixesTheLineAtTheBlanksMeanIntensity()
    {
        var calibration = CalibrationCurve.Build([new(0, [90, 110]), new(10, [1_100]), new(20, [2_100])], new CalibrationModel(ThroughBlank: true));

        Assert.Equal(100, calibration.Fit.Intercept);
        // slope = Σx(y − 100)/Σx² = (10·1000 + 20·2000)/(100 + 400) = 100.
        Assert.Equal(100, calibration.Fit.Slope, 10);
    }

    [Fact]
    public void DetectionFromBlanks_WorkedExample_IsThreeBlankSdOverTheSlope()
    {
        // Worked by hand from the definition LOD = 3·s_blank/slope, LOQ = 10·s_blank/slope [published: IUPAC;
        // Long & Winefordner, Anal. Chem. 55 (1983) 712A]: blanks 102, 98, 105, 95, 100 counts have mean 100,
        // squared deviations 4 + 4 + 25 + 25 + 0 = 58, s = √(58/4) = 3.80789 counts; at 500 counts per µg/L
        // LOD = 3 · 3.80789 / 500 = 0.0228473 µg/L and LOQ = 0.0761577 µg/L.
        var limits = DetectionFromBlanks.Compute([102, 98, 105, 95, 100], 500)!;

        Assert.Equal(100, limits.MeanIntensity, 10);
        Assert.Equal(3.807886553, limits.SdIntensity, 8);
        Assert.Equal(0.0228473193, limits.Detection, 9);
        Assert.Equal(0.0761577311, limits.Quantitation, 9);
    }

    [Fact]
    public void DetectionFromBlanks_OneBlankOrNoSlope_GivesNothing()
    {
        Assert.Null(DetectionFromBlanks.Compute([100], 500));
        Assert.Null(DetectionFromBlanks.Compute([100, 101], 0));
    }

    [Fact]
    public void Replicates_RsdAndRecovery_WorkedByHand()
    {
        // 9, 10, 11: mean 10, s = 1, RSD 10 %; 9.5 found of 10 expected is 95 % recovery.
        Assert.Equal(10, Replicates.RsdPercent([9, 10, 11])!.Value, 12);
        Assert.Null(Replicates.RsdPercent([10]));
        Assert.Null(Replicates.RsdPercent([-1, 1]));
        Assert.Equal(95, Replicates.RecoveryPercent(9.5, 10), 12);
    }
}
