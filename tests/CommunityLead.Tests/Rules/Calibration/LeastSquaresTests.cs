using CommunityLead.Rules.Calibration;
using MathNet.Numerics;
using MathNet.Numerics.LinearRegression;
using MathNet.Numerics.Statistics;

namespace CommunityLead.Tests.Rules.Calibration;

public class LeastSquaresTests
{
    /// <summary>Agreement to at least this many significant digits: |a − b| ≤ 10^−digits · |b|.</summary>
    private static void Digits(double expected, double actual, int digits) =>
        Assert.True(Math.Abs(actual - expected) <= Math.Pow(10, -digits) * Math.Abs(expected),
            $"expected {expected:R}, got {actual:R} (fewer than {digits} significant digits agree)");

    [Fact]
    public void Fit_NistNorris_MatchesEveryCertifiedValueToElevenDigits()
    {
        var fit = LeastSquares.Fit(NorrisData.X, NorrisData.Y);

        // Certified values [published: NIST StRD, Norris.dat].
        Digits(NorrisData.Intercept, fit.Intercept, 11);
        Digits(NorrisData.Slope, fit.Slope, 11);
        Digits(NorrisData.InterceptSd, fit.InterceptError!.Value, 11);
        Digits(NorrisData.SlopeSd, fit.SlopeError, 11);
        Digits(NorrisData.ResidualSd, fit.ResidualSd, 11);
        Digits(NorrisData.RSquared, fit.RSquared, 11);
        Digits(Math.Sqrt(NorrisData.RSquared), fit.R, 11);
        Assert.Equal(34, fit.DegreesOfFreedom);
    }

    [Fact]
    public void Fit_NistNorris_ResidualsAddUpToTheCertifiedResidualSumOfSquares()
    {
        var fit = LeastSquares.Fit(NorrisData.X, NorrisData.Y);

        // Residual sum of squares 26.6173985294224 on 34 degrees of freedom [published: NIST StRD, Norris.dat ANOVA table].
        Digits(26.6173985294224, fit.Residuals.Sum(e => e * e), 11);
        Assert.Equal(36, fit.Residuals.Count);
    }

    [Fact]
    public void Fit_Unweighted_AgreesWithMathNetLineAndCorrelation()
    {
        double[] x = [0, 1, 10, 100], y = [212, 5_310, 51_020, 498_900];
        var fit = LeastSquares.Fit(x, y);

        var (intercept, slope) = Fit.Line(x, y);
        Digits(intercept, fit.Intercept, 12);
        Digits(slope, fit.Slope, 12);
        Digits(Correlation.Pearson(x, y), fit.R, 12);
        Digits(GoodnessOfFit.RSquared(x.Select(v => fit.Predict(v)), y), fit.RSquared, 12);
    }

    [Theory]
    [InlineData(Weighting.InverseX)]
    [InlineData(Weighting.InverseXSquared)]
    public void Fit_Weighted_AgreesWithMathNetWeightedRegression(Weighting weighting)
    {
        double[] x = [1, 2, 5, 10, 20, 50, 100], y = [5_080, 10_010, 25_400, 49_700, 101_300, 248_000, 503_500];
        var fit = LeastSquares.Fit(x, y, weighting);

        var w = x.Select(v => weighting == Weighting.InverseX ? 1 / v : 1 / (v * v)).ToArray();
        var p = WeightedRegression.Weighted(x.Select(v => new[] { v }).ToArray(), y, w, intercept: true);
        Digits(p[0], fit.Intercept, 10);
        Digits(p[1], fit.Slope, 10);
    }

    [Fact]
    public void Fit_ThroughTheBlank_KeepsTheInterceptAndAgreesWithMathNetThroughOrigin()
    {
        double[] x = [0, 1, 10, 100], y = [200, 5_300, 51_000, 499_000];
        var fit = LeastSquares.Fit(x, y, fixedIntercept: 200);

        // Through a fixed point a, the slope is the through-origin slope of (x, y − a) [MathNet Fit.LineThroughOrigin].
        Digits(Fit.LineThroughOrigin(x, y.Select(v => v - 200).ToArray()), fit.Slope, 12);
        Assert.Equal(200, fit.Intercept);
        Assert.Null(fit.InterceptError);
        Assert.Equal(3, fit.DegreesOfFreedom);
    }

    [Fact]
    public void Weights_InverseX_GiveTheBlankTheWeightOfTheLowestStandard()
    {
        var w = LeastSquares.Weights([0, 2, 10], Weighting.InverseX);

        Assert.Equal([0.5, 0.5, 0.1], w);
    }

    [Fact]
    public void Fit_AllAtOneConcentration_IsRefused()
    {
        Assert.Throws<ArgumentException>(() => LeastSquares.Fit([5, 5, 5], [1, 2, 3]));
    }
}
