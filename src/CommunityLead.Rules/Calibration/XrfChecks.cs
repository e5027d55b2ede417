using CommunityLead.Rules.LabResults;
using static CommunityLead.Rules.LabResults.QcText;

namespace CommunityLead.Rules.Calibration;

/// <summary>Portable XRF: a certified reference soil's recovery, and repeat readings of one cup agreeing within their counting uncertainty.</summary>
internal static class XrfChecks
{
    public static void Check(RunInput run, QcWindows w, List<QcCheck> checks)
    {
        foreach (var reference in run.ReferenceSoils)
        {
            var mean = reference.Readings.Average(r => r.Value);
            var recovery = Replicates.RecoveryPercent(mean, reference.Certified);
            var passed = recovery >= w.ReferenceSoilLowPercent - 1e-9 && recovery <= w.ReferenceSoilHighPercent + 1e-9;
            var certified = reference.CertifiedUncertainty is { } u ? $"{Amount(reference.Certified)} ± {Amount(u)}" : Amount(reference.Certified);
            checks.Add(new(null, Analyte.Lead, "reference soil recovery %", recovery, w.ReferenceSoilLowPercent, w.ReferenceSoilHighPercent, passed,
                $"{reference.Name}: {reference.Readings.Count} readings average {Amount(mean)} against the certified {certified}: " +
                $"{Percent(recovery)}, {(passed ? "within" : "outside")} {Window(w.ReferenceSoilLowPercent, w.ReferenceSoilHighPercent)}"));
        }
        foreach (var repeat in run.Repeats.Where(r => r.Readings.Count >= 2))
        {
            var worst = 0.0;
            (XrfReading A, XrfReading B) pair = (repeat.Readings[0], repeat.Readings[1]);
            for (var i = 0; i < repeat.Readings.Count; i++)
                for (var j = i + 1; j < repeat.Readings.Count; j++)
                {
                    var (a, b) = (repeat.Readings[i], repeat.Readings[j]);
                    var sigmas = Math.Abs(a.Value - b.Value) / Math.Sqrt(a.Sigma * a.Sigma + b.Sigma * b.Sigma);
                    if (sigmas > worst) (worst, pair) = (sigmas, (a, b));
                }
            var passed = worst <= w.RepeatAgreementSigmas + 1e-9;
            checks.Add(new(null, Analyte.Lead, "repeat agreement (σ)", worst, null, w.RepeatAgreementSigmas, passed,
                $"{repeat.Label}: {repeat.Readings.Count} readings; the furthest apart, {Amount(pair.A.Value)} ± {Amount(pair.A.Sigma)} and " +
                $"{Amount(pair.B.Value)} ± {Amount(pair.B.Sigma)}, differ by {worst:0.0} combined σ, {(passed ? "within" : "more than")} {w.RepeatAgreementSigmas:0.##}"));
        }
    }
}
