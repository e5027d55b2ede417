using CommunityLead.Rules.LabResults;
using static CommunityLead.Rules.LabResults.QcText;

namespace CommunityLead.Rules.Calibration;

/// <summary>
/// The run order: a calibration check after every N samples and at the end [published: EPA Methods 200.7/200.8],
/// read from the positions the lab sent, and the blanks' drift through the run. Judged only for an analyte whose
/// samples and checks all carry a position.
/// </summary>
internal static class SequenceChecks
{
    public static void Check(RunInput run, QcWindows w, List<QcCheck> checks)
    {
        foreach (var analyte in run.Samples.Select(s => s.Analyte).Distinct().OrderBy(a => a))
        {
            var samples = run.Samples.Where(s => s.Analyte == analyte).ToList();
            var points = run.Sequence.Where(p => p.Analyte == analyte).ToList();
            var checksRun = points.Where(p => p.Type == QcType.CalibrationCheck).ToList();
            if (samples.Any(s => s.RunOrder is null) || checksRun.Count == 0 || checksRun.Any(p => p.RunOrder is null)) continue;
            checks.Add(Spacing(analyte, [.. samples.Select(s => s.RunOrder!.Value)], [.. checksRun.Select(p => p.RunOrder!.Value)], w.SamplesPerCalibrationCheck));
            var blanks = points.Where(p => p.Type == QcType.CalibrationBlank && p.RunOrder is not null && p.Measured is not null)
                .OrderBy(p => p.RunOrder).ToList();
            if (blanks.Count >= 2) checks.Add(Drift(analyte, blanks, samples.Min(s => s.ReportingLimit), w));
        }
    }

    private static QcCheck Spacing(Analyte analyte, List<int> samples, List<int> checksAt, int perCheck)
    {
        samples.Sort();
        checksAt.Sort();
        // Walk the run in order: a check resets the count of samples since the last one.
        int longest = 0, run = 0, longestEndsAt = 0, next = 0;
        foreach (var position in samples)
        {
            while (next < checksAt.Count && checksAt[next] < position) (run, next) = (0, next + 1);
            run++;
            if (run > longest) (longest, longestEndsAt) = (run, position);
        }
        var endChecked = checksAt.Max() > samples.Max();
        var passed = longest <= perCheck && endChecked;
        var detail = $"Up to {longest} samples between calibration checks in the run order (at most {perCheck})" +
            (longest > perCheck ? $", {longest} running up to position {longestEndsAt}" : "") +
            (endChecked ? "; a check follows the last sample" : $"; no check after the last sample (position {samples.Max()})");
        return new(null, analyte, "check-standard spacing", longest, null, perCheck, passed, detail);
    }

    private static QcCheck Drift(Analyte analyte, List<RunQcPoint> blanks, double reportingLimit, QcWindows w)
    {
        var drift = blanks[^1].Measured!.Value - blanks[0].Measured!.Value;
        var allowed = w.MaxBlankDriftOfReportingLimit * reportingLimit;
        var passed = Math.Abs(drift) <= allowed + 1e-9;
        return new(null, analyte, "blank drift", drift, -allowed, allowed, passed,
            $"Blanks went from {Amount(blanks[0].Measured!.Value)} (position {blanks[0].RunOrder}) to {Amount(blanks[^1].Measured!.Value)} " +
            $"(position {blanks[^1].RunOrder}): a drift of {Amount(drift)}, {(passed ? "within" : "beyond")} ±{Amount(allowed)} " +
            $"({w.MaxBlankDriftOfReportingLimit:0.##} × the reporting limit)");
    }
}
