namespace CommunityLead.Rules.Calibration;

/// <summary>A calibration standard: its nominal concentration and the replicate intensities read on it.</summary>
public sealed record StandardReading(double Nominal, IReadOnlyList<double> Intensities);

/// <summary>A standard read back through the fitted curve. <paramref name="RecoveryPercent"/> is null for the blank.</summary>
public sealed record BackCalculated(double Nominal, double MeanIntensity, double Found, double? RecoveryPercent, double? RsdPercent);

/// <summary>A fitted calibration: the line over the standards' mean intensities, and each standard read back.</summary>
public sealed record CalibrationCurve(CalibrationModel Model, LineFit Fit, IReadOnlyList<BackCalculated> Standards)
{
    /// <summary>The highest and lowest non-zero standards: the calibrated range.</summary>
    public double Highest => Standards.Max(s => s.Nominal);
    public double LowestAboveBlank => Standards.Where(s => s.Nominal > 0).Select(s => s.Nominal).DefaultIfEmpty(double.NaN).Min();

    /// <summary>
    /// Fits the means of each standard's replicates, as instrument software does [practice], so that the residuals
    /// and r describe the curve, not the replicate noise (replicate precision is judged separately, by RSD).
    /// </summary>
    public static CalibrationCurve Build(IReadOnlyList<StandardReading> standards, CalibrationModel model)
    {
        ArgumentNullException.ThrowIfNull(standards);
        ArgumentNullException.ThrowIfNull(model);
        if (standards.Any(s => s.Intensities.Count == 0)) throw new ArgumentException("Every standard needs a reading.", nameof(standards));
        var x = standards.Select(s => s.Nominal).ToList();
        var y = standards.Select(s => Replicates.Mean(s.Intensities)).ToList();
        // "Through the blank": the blank's mean intensity, or zero counts when no blank standard was read.
        double? fixedAt = model.ThroughBlank ? standards.Where(s => s.Nominal == 0).Select(s => Replicates.Mean(s.Intensities)).DefaultIfEmpty(0).First() : null;
        var fit = LeastSquares.Fit(x, y, model.Weighting, fixedAt);
        var back = standards.Select((s, i) =>
        {
            var found = fit.Inverse(y[i]);
            return new BackCalculated(s.Nominal, y[i], found, s.Nominal > 0 ? Replicates.RecoveryPercent(found, s.Nominal) : null,
                Replicates.RsdPercent(s.Intensities));
        }).ToList();
        return new CalibrationCurve(model, fit, back);
    }
}
