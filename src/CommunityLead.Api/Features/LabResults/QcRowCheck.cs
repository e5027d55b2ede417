using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.LabResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Checks that each QC row is complete for its type, and normalises it to the results' units.</summary>
internal sealed class QcRowCheck(BatchProblemList problems)
{
    public List<CheckedQc> CheckAll(IReadOnlyList<QcRow> rows, Matrix matrix)
    {
        var checkedRows = new List<CheckedQc>();
        foreach (var row in rows)
            if (Check(row, matrix) is { } qc) checkedRows.Add(qc);
        return checkedRows;
    }

    private CheckedQc? Check(QcRow row, Matrix matrix)
    {
        var before = problems.Count;
        void Problem(string field, string reason) => problems.Add(new(row.Where, field, reason));
        if (!KebabEnum.TryParse<QcType>(row.Type, out var type))
            Problem(row.Where.StartsWith("row", StringComparison.Ordinal) ? "sampleType" : "type",
                $"Use sample or one of: {KebabEnum.Allowed<QcType>()}.");
        if (!Analytes.TryParse(row.Analyte, out var analyte)) Problem("analyte", "lead (Pb) or copper (Cu).");
        double factor = 1;
        if (problems.Count == before && !Units.TryFactor(analyte, matrix, row.Unit, out factor, out var unitError))
            Problem("unit", unitError!);
        if (problems.Count > before) return null;

        var incomplete = false;
        foreach (var field in Required(type).Where(f => Value(row, f) is null))
        {
            incomplete = true;
            if (row.Unreadable?.Contains(field) != true) Problem(field, $"A {KebabEnum.Name(type)} needs '{field}'.");
        }
        foreach (var field in new[] { "expected", "spikeAdded", "duplicate", "unspiked" })
            if (Value(row, field) is < 0) Problem(field, "Cannot be negative.");
        // A calibration blank may read slightly below zero; other measurements may not.
        if (type != QcType.CalibrationBlank && row.Measured is < 0) Problem("measured", "Cannot be negative.");
        // mg/L becomes µg/L by × 1000: a figure near double's limit would turn into infinity, which JSON cannot hold.
        foreach (var field in new[] { "expected", "measured", "unspiked", "spikeAdded", "duplicate" })
            if (Value(row, field) is { } n && !double.IsFinite(n * factor))
                Problem(field, $"{n} {row.Unit?.Trim()} is too large to convert to {Analytes.NormalUnit(analyte, matrix)}.");
        if (Figure(type, row) is { } figure && !double.IsFinite(figure.Value))
            Problem(figure.Field, $"With this {figure.Field} the {KebabEnum.Name(type)}'s figure cannot be computed (it would be infinite); check the figures and their unit.");
        if (problems.Count > before || incomplete) return null;

        return new CheckedQc(new QcSample(type, analyte, row.Expected * factor, row.Measured * factor,
            row.Unspiked * factor, row.SpikeAdded * factor, row.Duplicate * factor), Analytes.NormalUnit(analyte, matrix));
    }

    /// <summary>
    /// What the QC figure divides by or adds up, with the field to blame: a tiny expected amount (1e-300) under a
    /// large reading makes a recovery infinite, and two readings near double's limit overflow their mean.
    /// </summary>
    private static (string Field, double Value)? Figure(QcType type, QcRow row) => type switch
    {
        QcType.CalibrationCheck or QcType.FortifiedBlank when row is { Expected: > 0, Measured: { } m } => ("expected", m / row.Expected.Value * 100),
        QcType.MatrixSpike when row is { SpikeAdded: > 0, Measured: { } m, Unspiked: { } u } => ("spikeAdded", (m - u) / row.SpikeAdded.Value * 100),
        QcType.Duplicate when row is { Measured: { } a, Duplicate: { } b } => ("duplicate", (a + b) / 2),
        _ => null,
    };

    private static string[] Required(QcType type) => type switch
    {
        QcType.CalibrationCheck or QcType.FortifiedBlank => ["expected", "measured"],
        QcType.CalibrationBlank => ["measured"],
        QcType.Duplicate => ["measured", "duplicate"],
        _ => ["unspiked", "spikeAdded", "measured"],
    };

    private static double? Value(QcRow row, string field) => field switch
    {
        "expected" => row.Expected,
        "measured" => row.Measured,
        "unspiked" => row.Unspiked,
        "spikeAdded" => row.SpikeAdded,
        _ => row.Duplicate,
    };
}
