namespace CommunityLead.Rules.Calibration;

/// <summary>
/// Weighted least squares for a straight line, in centred sums (two passes) so that data far from the origin keep
/// their digits; checked against NIST StRD "Norris" and MathNet.Numerics in the tests.
/// </summary>
public static class LeastSquares
{
    /// <param name="fixedIntercept">When given, only the slope is fitted: y − fixedIntercept = slope·x.</param>
    public static LineFit Fit(IReadOnlyList<double> x, IReadOnlyList<double> y, Weighting weighting = Weighting.None,
        double? fixedIntercept = null)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        if (x.Count != y.Count) throw new ArgumentException("x and y need the same number of points.", nameof(y));
        var fitted = fixedIntercept is null ? 2 : 1;
        if (x.Count <= fitted) throw new ArgumentException($"At least {fitted + 1} points are needed.", nameof(x));
        if (x.Concat(y).Any(v => !double.IsFinite(v))) throw new ArgumentException("Every point must be a finite number.", nameof(x));

        var w = Weights(x, weighting);
        var sumW = w.Sum();
        var meanX = Weighted(w, x) / sumW;
        var meanY = Weighted(w, y) / sumW;
        double sxx = 0, sxy = 0, syy = 0;
        for (var i = 0; i < x.Count; i++)
        {
            sxx += w[i] * (x[i] - meanX) * (x[i] - meanX);
            sxy += w[i] * (x[i] - meanX) * (y[i] - meanY);
            syy += w[i] * (y[i] - meanY) * (y[i] - meanY);
        }
        if (sxx <= 0) throw new ArgumentException("The points need at least two different x values.", nameof(x));

        double slope, intercept, sst;
        if (fixedIntercept is { } a)
        {
            // Through a fixed point: slope = Σw·x·(y−a) / Σw·x², and the spread is judged about that point.
            double sx2 = 0, sxd = 0;
            sst = 0;
            for (var i = 0; i < x.Count; i++)
            {
                sx2 += w[i] * x[i] * x[i];
                sxd += w[i] * x[i] * (y[i] - a);
                sst += w[i] * (y[i] - a) * (y[i] - a);
            }
            slope = sxd / sx2;
            intercept = a;
            sxx = sx2;
        }
        else
        {
            slope = sxy / sxx;
            intercept = meanY - slope * meanX;
            sst = syy;
        }

        var residuals = new double[x.Count];
        double sse = 0;
        for (var i = 0; i < x.Count; i++)
        {
            residuals[i] = y[i] - (intercept + slope * x[i]);
            sse += w[i] * residuals[i] * residuals[i];
        }
        var df = x.Count - fitted;
        var variance = sse / df;
        double? interceptError = fixedIntercept is null ? Math.Sqrt(variance * (1 / sumW + meanX * meanX / sxx)) : null;
        var r = syy > 0 ? sxy / Math.Sqrt(Sumsq(w, x, meanX) * syy) : 0;
        var rSquared = sst > 0 ? 1 - sse / sst : 1;
        return new LineFit(slope, intercept, Math.Sqrt(variance / sxx), interceptError, r, rSquared, Math.Sqrt(variance), df, residuals);
    }

    /// <summary>
    /// 1/x and 1/x² cannot weight the blank (x = 0); it gets the weight of the lowest standard above zero, so it still
    /// counts without dominating [our choice; instrument software differs here].
    /// </summary>
    public static double[] Weights(IReadOnlyList<double> x, Weighting weighting)
    {
        if (weighting == Weighting.None) return [.. x.Select(_ => 1.0)];
        var positive = x.Where(v => v > 0).ToList();
        if (positive.Count == 0) throw new ArgumentException("Weighting by 1/x needs concentrations above zero.", nameof(x));
        var floor = positive.Min();
        return [.. x.Select(v => Math.Max(v, floor)).Select(v => weighting == Weighting.InverseX ? 1 / v : 1 / (v * v))];
    }

    private static double Weighted(double[] w, IReadOnlyList<double> v) => w.Select((wi, i) => wi * v[i]).Sum();

    private static double Sumsq(double[] w, IReadOnlyList<double> v, double mean) =>
        w.Select((wi, i) => wi * (v[i] - mean) * (v[i] - mean)).Sum();
}
