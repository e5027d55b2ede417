namespace CommunityLead.Rules.Calibration;

/// <summary>
/// A least-squares straight line y = Intercept + Slope·x. <paramref name="InterceptError"/> is null when the
/// intercept was fixed rather than fitted. <paramref name="Residuals"/> are y − ŷ in the order of the points.
/// <paramref name="ResidualSd"/> is the (weighted) residual standard deviation √(Σw·e² / degrees of freedom).
/// <paramref name="R"/> is the (weighted) Pearson correlation of the points; <paramref name="RSquared"/> is
/// 1 − SSE/SST about the mean (fitted intercept) or about the fixed intercept (fixed).
/// </summary>
public sealed record LineFit(
    double Slope,
    double Intercept,
    double SlopeError,
    double? InterceptError,
    double R,
    double RSquared,
    double ResidualSd,
    int DegreesOfFreedom,
    IReadOnlyList<double> Residuals)
{
    public double Predict(double x) => Intercept + Slope * x;

    /// <summary>The concentration that gives this intensity: the curve read backwards.</summary>
    public double Inverse(double y) => (y - Intercept) / Slope;
}
