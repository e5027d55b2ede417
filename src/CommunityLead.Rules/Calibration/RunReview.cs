using CommunityLead.Rules.LabResults;

namespace CommunityLead.Rules.Calibration;

/// <summary>A fitted curve with what was read on it: the figures the QC report draws.</summary>
/// <param name="Computed">Each sample's concentration from its own intensities, where the lab sent them.</param>
public sealed record CurveReview(Analyte Analyte, string? Line, CalibrationCurve Curve, BlankLimits? Blanks,
    IReadOnlyList<(RunSample Sample, double Concentration)> Computed);

/// <summary>The run's checks, to be added to the batch's QC verdict, and the curves behind them.</summary>
public sealed record RunReview(IReadOnlyList<QcCheck> Checks, IReadOnlyList<CurveReview> Curves)
{
    public static RunReview Evaluate(RunInput run, QcWindows windows)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(windows);
        var checks = new List<QcCheck>();
        var curves = new List<CurveReview>();
        foreach (var calibration in run.Calibrations)
        {
            var samples = run.Samples.Where(s => s.Analyte == calibration.Analyte).ToList();
            var curve = CurveChecks.Check(calibration, samples, windows, checks);
            curves.Add(SampleChecks.Check(curve, samples, windows, checks));
        }
        SequenceChecks.Check(run, windows, checks);
        XrfChecks.Check(run, windows, checks);
        return new RunReview(checks, curves);
    }

    /// <summary>The batch's verdict with the run's checks added: any failure here holds the batch like any other QC failure.</summary>
    public QcVerdict Extend(QcVerdict verdict) =>
        Checks.Count == 0 ? verdict : new QcVerdict(verdict.Passed && Checks.All(c => c.Passed), [.. verdict.Checks, .. Checks]);
}
