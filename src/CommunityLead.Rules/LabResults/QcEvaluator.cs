namespace CommunityLead.Rules.LabResults;

/// <summary>
/// Reviews the QC of one analysis batch: one check per QC sample, then one check per analyte that the batch
/// has samples for, counting its calibration checks.
/// </summary>
public static class QcEvaluator
{
    public static QcVerdict Evaluate(IReadOnlyList<QcSample> qc, IReadOnlyDictionary<Analyte, int> sampleCounts,
        IReadOnlyDictionary<Analyte, double> reportingLimits, QcWindows windows)
    {
        ArgumentNullException.ThrowIfNull(qc);
        ArgumentNullException.ThrowIfNull(sampleCounts);
        ArgumentNullException.ThrowIfNull(reportingLimits);
        ArgumentNullException.ThrowIfNull(windows);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(windows.SamplesPerCalibrationCheck);

        var checks = qc.Select(sample => QcSampleChecks.Check(sample, reportingLimits, windows)).ToList();
        foreach (var (analyte, samples) in sampleCounts.Where(p => p.Value > 0).OrderBy(p => p.Key))
        {
            var run = qc.Count(s => s.Type == QcType.CalibrationCheck && s.Analyte == analyte);
            checks.Add(Frequency(analyte, samples, run, windows.SamplesPerCalibrationCheck));
        }
        return new QcVerdict(checks.All(c => c.Passed), checks);
    }

    /// <summary>
    /// "After every 10 samples and at the end" (EPA Methods 200.7/200.8) comes to one check per started block
    /// of 10: 10 samples need 1, 11 need 2, 25 need 3.
    /// </summary>
    private static QcCheck Frequency(Analyte analyte, int samples, int run, int perCheck)
    {
        var required = Math.Max(1, (samples + perCheck - 1) / perCheck);
        var detail = $"{Plural(samples, "sample")} {(samples == 1 ? "needs" : "need")} at least " +
            $"{Plural(required, "calibration check")} (one per {perCheck} samples); {run} {(run == 1 ? "was" : "were")} run";
        return new QcCheck(null, analyte, "calibration checks", run, required, null, run >= required, detail);
    }

    private static string Plural(int n, string noun) => n == 1 ? $"{n} {noun}" : $"{n} {noun}s";
}
