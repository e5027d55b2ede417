using CommunityLead.Rules.LabResults;

namespace CommunityLead.Tests.Rules.LabResults;

/// <summary>Short builders for QC samples, and one-sample evaluation with default windows and a lead RL of 1.0 µg/L.</summary>
internal static class Qc
{
    public static readonly QcWindows DefaultWindows = new();

    public static QcSample CalibrationCheck(double? expected, double? measured, Analyte analyte = Analyte.Lead) =>
        new(QcType.CalibrationCheck, analyte, expected, measured, null, null, null);

    public static QcSample FortifiedBlank(double? spiked, double? measured) =>
        new(QcType.FortifiedBlank, Analyte.Lead, spiked, measured, null, null, null);

    public static QcSample MatrixSpike(double? unspiked, double? added, double? measured) =>
        new(QcType.MatrixSpike, Analyte.Lead, null, measured, unspiked, added, null);

    public static QcSample Duplicate(double? measured, double? duplicate, Analyte analyte = Analyte.Lead) =>
        new(QcType.Duplicate, analyte, null, measured, null, null, duplicate);

    public static QcSample Blank(double? measured, Analyte analyte = Analyte.Lead) =>
        new(QcType.CalibrationBlank, analyte, null, measured, null, null, null);

    public static Dictionary<Analyte, double> LeadLimit(double rl) => new() { [Analyte.Lead] = rl };

    /// <summary>The check for one QC sample, in a batch with no samples (so no frequency check).</summary>
    public static QcCheck Single(QcSample sample, double? leadReportingLimit = 1.0)
    {
        var limits = leadReportingLimit is { } rl ? LeadLimit(rl) : [];
        var verdict = QcEvaluator.Evaluate([sample], new Dictionary<Analyte, int>(), limits, DefaultWindows);
        var check = Assert.Single(verdict.Checks);
        Assert.Equal(check.Passed, verdict.Passed);
        Assert.Equal(sample.Type, check.Type);
        Assert.Equal(sample.Analyte, check.Analyte);
        return check;
    }
}
