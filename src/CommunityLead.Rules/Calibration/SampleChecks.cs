using CommunityLead.Rules.LabResults;
using static CommunityLead.Rules.LabResults.QcText;

namespace CommunityLead.Rules.Calibration;

/// <summary>Each sample against the curve: our concentration from its intensities, its replicates, and the calibrated range.</summary>
internal static class SampleChecks
{
    /// <summary>The text the lab and the coordinator see on a sample above the highest standard [practice].</summary>
    public const string AboveRange = "above the calibrated range: dilute and analyse again";

    public static CurveReview Check(CurveReview review, IReadOnlyList<RunSample> samples, QcWindows w, List<QcCheck> checks)
    {
        var curve = review.Curve;
        var computed = new List<(RunSample, double)>();
        foreach (var s in samples)
        {
            double? ours = null;
            if (s.Intensities is { Count: > 0 } readings)
            {
                ours = curve.Fit.Inverse(Replicates.Mean(readings));
                computed.Add((s, ours.Value));
                checks.Add(Compare(s, ours.Value, w));
                if (Replicates.RsdPercent(readings) is { } rsd)
                    checks.Add(Precision.Rsd(s.Analyte, s.Label, ours.Value, rsd, review.Blanks, s.ReportingLimit, w));
            }
            var concentration = ours ?? (s.Censored ? (double?)null : s.Reported);
            if (concentration is not { } c) continue;
            if (c > curve.Highest * (1 + 1e-9))
                checks.Add(new(null, s.Analyte, "calibrated range", c, null, curve.Highest, false,
                    $"{s.Label} at {Amount(c)} is {AboveRange} (highest standard {Amount(curve.Highest)}); its result is held out of letters until re-analysed"));
            else if (c < curve.LowestAboveBlank && c >= (review.Blanks?.Detection ?? s.Mdl))
                checks.Add(new(null, s.Analyte, "calibrated range", c, curve.LowestAboveBlank, curve.Highest, true,
                    $"{s.Label} at {Amount(c)} is below the lowest standard {Amount(curve.LowestAboveBlank)} and above the detection limit: an estimate (J)"));
        }
        return review with { Computed = computed };
    }

    private static QcCheck Compare(RunSample s, double ours, QcWindows w)
    {
        const string figure = "computed vs reported %";
        if (s.Censored)
        {
            var below = ours < s.ReportingLimit;
            return new(null, s.Analyte, figure, null, null, w.MaxComputedDifferencePercent, below, below
                ? $"{s.Label}: reported below the reporting limit {Amount(s.ReportingLimit)}; its intensities give {Amount(ours)}, below it too"
                : $"{s.Label}: reported below the reporting limit {Amount(s.ReportingLimit)}, but its intensities give {Amount(ours)}");
        }
        if (s.Reported <= 0)
            return new(null, s.Analyte, figure, null, null, w.MaxComputedDifferencePercent, Math.Abs(ours) < s.ReportingLimit,
                $"{s.Label}: reported {Amount(s.Reported)}; its intensities give {Amount(ours)}");
        var difference = Math.Abs(ours - s.Reported) / s.Reported * 100;
        var passed = difference <= w.MaxComputedDifferencePercent + 1e-9;
        return new(null, s.Analyte, figure, difference, null, w.MaxComputedDifferencePercent, passed,
            $"{s.Label}: reported {Amount(s.Reported)}, the lab's own intensities give {Amount(ours)} through the curve: " +
            $"{Percent(difference)} apart, {(passed ? "within" : "more than")} {Percent0(w.MaxComputedDifferencePercent)}");
    }
}
