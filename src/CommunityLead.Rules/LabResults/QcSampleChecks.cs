using static CommunityLead.Rules.LabResults.QcText;

namespace CommunityLead.Rules.LabResults;

/// <summary>The figure and verdict for each kind of QC sample.</summary>
internal static class QcSampleChecks
{
    private const string RecoveryFigure = "recovery %";
    private const string RpdFigure = "RPD %";
    private const string BlankFigure = "blank vs reporting limit";

    /// <summary>
    /// Percentages computed from decimal inputs carry binary rounding (11.0 / 10.0 · 100 = 110.00000000000001),
    /// so a result that is exactly on a window edge on paper is given this much slack rather than failing.
    /// </summary>
    private const double Slack = 1e-9;

    public static QcCheck Check(QcSample s, IReadOnlyDictionary<Analyte, double> reportingLimits, QcWindows w) => s.Type switch
    {
        QcType.CalibrationCheck => Recovery(s, s.Measured, s.Expected, w.CalibrationCheckLowPercent, w.CalibrationCheckHighPercent,
            Missing((!Known(s.Measured), "a measured value"), (!Positive(s.Expected), "an expected value above zero"))),
        QcType.FortifiedBlank => Recovery(s, s.Measured, s.Expected, w.FortifiedBlankLowPercent, w.FortifiedBlankHighPercent,
            Missing((!Known(s.Measured), "a measured value"), (!Positive(s.Expected), "an expected (spiked) amount above zero"))),
        // Recovery of a spike in a real sample counts only what the spike added on top of the sample's own content.
        QcType.MatrixSpike => Recovery(s, s.Measured - s.Unspiked, s.SpikeAdded, w.MatrixSpikeLowPercent, w.MatrixSpikeHighPercent,
            Missing((!Known(s.Measured), "a measured value"), (!Known(s.Unspiked), "the unspiked result"),
                (!Positive(s.SpikeAdded), "a spike amount above zero"))),
        QcType.Duplicate => Duplicate(s, Limit(reportingLimits, s.Analyte), w.DuplicateMaxRpdPercent),
        QcType.CalibrationBlank => Blank(s, Limit(reportingLimits, s.Analyte)),
        _ => throw new ArgumentOutOfRangeException(nameof(s), $"Unknown QC type {s.Type}."),
    };

    private static QcCheck Recovery(QcSample s, double? found, double? added, double low, double high, string? missing)
    {
        if (missing is not null)
            return new(s.Type, s.Analyte, RecoveryFigure, null, low, high, false, $"Cannot be checked: {missing}");
        var recovery = found!.Value / added!.Value * 100;
        var passed = recovery >= low - Slack && recovery <= high + Slack;
        var detail = passed
            ? $"{Percent(recovery)} recovery, window {Window(low, high)}"
            : $"{Percent(recovery)} recovery, outside the window {Window(low, high)}";
        return new(s.Type, s.Analyte, RecoveryFigure, recovery, low, high, passed, detail);
    }

    private static QcCheck Duplicate(QcSample s, double? reportingLimit, double maxRpd)
    {
        var missing = Missing((!Known(s.Measured), "a measured value"), (!Known(s.Duplicate), "a duplicate value"));
        if (missing is not null)
            return new(s.Type, s.Analyte, RpdFigure, null, null, maxRpd, false, $"Cannot be checked: {missing}");
        double a = s.Measured!.Value, b = s.Duplicate!.Value;
        // [practice] Near the reporting limit the absolute noise is a large share of the result, so two honest
        // readings can differ by far more than 20%; labs do not judge precision on results below the limit.
        if (reportingLimit is { } rl && (a < rl || b < rl))
            return NotEvaluated(s, maxRpd,
                $"Not evaluated: {Amount(Math.Min(a, b))} is below the reporting limit {Amount(rl)}, where RPD says nothing about precision");
        var mean = (a + b) / 2;
        if (mean <= 0)
            return NotEvaluated(s, maxRpd, $"Not evaluated: the two results average {Amount(mean)}, so a relative difference means nothing");
        var rpd = Math.Abs(a - b) / mean * 100;
        var passed = rpd <= maxRpd + Slack;
        var detail = passed
            ? $"RPD {Percent(rpd)} between {Amount(a)} and {Amount(b)}, limit {Percent0(maxRpd)}"
            : $"RPD {Percent(rpd)} between {Amount(a)} and {Amount(b)}, over the limit of {Percent0(maxRpd)}";
        return new(s.Type, s.Analyte, RpdFigure, rpd, null, maxRpd, passed, detail);
    }

    private static QcCheck NotEvaluated(QcSample s, double maxRpd, string detail) =>
        new(s.Type, s.Analyte, RpdFigure, null, null, maxRpd, true, detail);

    /// <summary>
    /// [practice] A calibration blank should read below the reporting limit: anything at or above it would be
    /// reported as lead (or copper) in a sample that had none.
    /// </summary>
    private static QcCheck Blank(QcSample s, double? reportingLimit)
    {
        if (!Known(s.Measured))
            return new(s.Type, s.Analyte, BlankFigure, null, null, reportingLimit, false, "Cannot be checked: a measured value is missing");
        var measured = s.Measured!.Value;
        if (reportingLimit is not { } rl)
            return new(s.Type, s.Analyte, BlankFigure, measured, null, null, false,
                $"Cannot be checked: no reporting limit is known for {s.Analyte.ToString().ToLowerInvariant()} in this batch");
        var passed = measured < rl;
        var detail = passed
            ? $"Blank read {Amount(measured)}, below the reporting limit {Amount(rl)}"
            : $"Blank read {Amount(measured)}, at or above the reporting limit {Amount(rl)}";
        return new(s.Type, s.Analyte, BlankFigure, measured, null, rl, passed, detail);
    }

    private static double? Limit(IReadOnlyDictionary<Analyte, double> limits, Analyte analyte) =>
        limits.TryGetValue(analyte, out var rl) && double.IsFinite(rl) ? rl : null;

    private static bool Known(double? x) => x is { } v && double.IsFinite(v);

    private static bool Positive(double? x) => Known(x) && x > 0;
}
