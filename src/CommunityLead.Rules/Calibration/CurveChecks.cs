using CommunityLead.Rules.LabResults;
using static CommunityLead.Rules.LabResults.QcText;

namespace CommunityLead.Rules.Calibration;

/// <summary>The curve itself: its figures, r, each standard read back, replicate precision, and the blank-derived limits.</summary>
internal static class CurveChecks
{
    private const double Slack = 1e-9;

    public static CurveReview Check(RunCalibration c, IReadOnlyList<RunSample> samples, QcWindows w, List<QcCheck> checks)
    {
        var model = c.Model ?? new CalibrationModel(w.CalibrationThroughBlank, w.CalibrationWeighting);
        var curve = CalibrationCurve.Build(c.Standards, model);
        var fit = curve.Fit;
        var name = c.Line is null ? "" : $" ({c.Line})";
        var intercept = fit.InterceptError is { } ie ? $"intercept {Amount(fit.Intercept)} ± {Amount(ie)}" : $"intercept fixed at the blank, {Amount(fit.Intercept)}";
        checks.Add(new(null, c.Analyte, "calibration slope", fit.Slope, null, null, true,
            $"Curve{name}: slope {Amount(fit.Slope)} ± {Amount(fit.SlopeError)} counts per unit, {intercept}, residual SD {Amount(fit.ResidualSd)}, " +
            $"R² {fit.RSquared:0.000000}, {Describe(model)}, {curve.Standards.Count} standards"));
        checks.Add(new(null, c.Analyte, "correlation r", fit.R, w.MinCorrelation, null, fit.R >= w.MinCorrelation - Slack,
            fit.R >= w.MinCorrelation - Slack
                ? $"r = {fit.R:0.00000}{name}, at least {w.MinCorrelation}"
                : $"r = {fit.R:0.00000}{name}, below {w.MinCorrelation}: the curve is not linear enough to read results from"));

        var blanks = c.BlankIntensities.Count >= 2 ? c.BlankIntensities
            : c.Standards.Where(s => s.Nominal == 0).SelectMany(s => s.Intensities).ToList();
        var limits = DetectionFromBlanks.Compute(blanks, fit.Slope);
        var lowest = curve.LowestAboveBlank;
        foreach (var (s, i) in curve.Standards.Select((s, i) => (s, i)))
        {
            if (s.RecoveryPercent is { } rec)
            {
                var allowed = s.Nominal == lowest ? w.BackCalculatedLowestPercent : w.BackCalculatedPercent;
                var passed = Math.Abs(rec - 100) <= allowed + Slack;
                checks.Add(new(null, c.Analyte, "back-calculated %", rec, 100 - allowed, 100 + allowed, passed,
                    $"Standard {Amount(s.Nominal)} reads back as {Amount(s.Found)}: {Percent(rec)} of nominal, " +
                    $"{(passed ? "within" : "outside")} ±{Percent0(allowed)}{(s.Nominal == lowest ? " (lowest standard)" : "")}"));
            }
            else
                checks.Add(new(null, c.Analyte, "blank reads back", s.Found, null, null, true, $"The blank standard reads back as {Amount(s.Found)}"));
            if (s.RsdPercent is { } rsd)
                checks.Add(Precision.Rsd(c.Analyte, $"standard {Amount(s.Nominal)}", s.Nominal, rsd, limits, w));
        }

        if (limits is not null) checks.Add(Detection(c.Analyte, limits, samples, w));
        return new CurveReview(c.Analyte, c.Line, curve, limits, []);
    }

    /// <summary>
    /// The blanks say how low the lab can see; a reporting limit below that reports noise as lead, and an MDL far
    /// below it claims more than the blanks show.
    /// </summary>
    private static QcCheck Detection(Analyte analyte, BlankLimits limits, IReadOnlyList<RunSample> samples, QcWindows w)
    {
        var text = $"Detection limit from {limits.Count} blank readings (3 × SD {Amount(limits.SdIntensity)} counts ÷ slope): " +
            $"{Amount(limits.Detection)}; quantitation limit (10 ×) {Amount(limits.Quantitation)}";
        if (samples.Count == 0) return new(null, analyte, "detection limit from blanks", limits.Detection, null, null, true, text);
        var rl = samples.Min(s => s.ReportingLimit);
        var mdl = samples.Min(s => s.Mdl);
        var high = Math.Min(rl, mdl * w.MaxDetectionLimitOverMdl);
        var passed = limits.Detection <= high + Slack;
        var verdict = limits.Detection > rl
            ? $", above the reporting limit {Amount(rl)}: results near it would be noise"
            : limits.Detection > mdl * w.MaxDetectionLimitOverMdl
                ? $", more than {w.MaxDetectionLimitOverMdl:0.##} × the reported MDL {Amount(mdl)}"
                : $", within the reporting limit {Amount(rl)} and {w.MaxDetectionLimitOverMdl:0.##} × the reported MDL {Amount(mdl)}";
        return new(null, analyte, "detection limit from blanks", limits.Detection, null, high, passed, text + verdict);
    }

    private static string Describe(CalibrationModel m) =>
        (m.Weighting switch { Weighting.InverseX => "weighted 1/x", Weighting.InverseXSquared => "weighted 1/x²", _ => "unweighted" })
        + (m.ThroughBlank ? ", through the blank" : "");
}

/// <summary>Replicate RSD, not judged where the readings are near the detection limit.</summary>
internal static class Precision
{
    public static QcCheck Rsd(Analyte analyte, string what, double concentration, double rsd, BlankLimits? limits, double reportingLimit, QcWindows w)
    {
        // Below the quantitation limit (10 s of the blanks) or, without blanks, the reporting limit, the counting noise
        // is a large share of the signal and RSD says little about the lab's precision [practice].
        var floor = limits?.Quantitation ?? reportingLimit;
        if (concentration < floor)
            return new(null, analyte, "replicate RSD %", rsd, null, w.MaxReplicateRsdPercent, true,
                $"Not judged: {what} at {Amount(concentration)} is below {(limits is null ? "the reporting limit" : "the quantitation limit")} {Amount(floor)}; RSD {Percent(rsd)}");
        var passed = rsd <= w.MaxReplicateRsdPercent + 1e-9;
        return new(null, analyte, "replicate RSD %", rsd, null, w.MaxReplicateRsdPercent, passed,
            $"Replicates of {what}: RSD {Percent(rsd)}, {(passed ? "within" : "over")} {Percent0(w.MaxReplicateRsdPercent)}");
    }

    public static QcCheck Rsd(Analyte analyte, string what, double concentration, double rsd, BlankLimits? limits, QcWindows w) =>
        Rsd(analyte, what, concentration, rsd, limits, 0, w);
}
