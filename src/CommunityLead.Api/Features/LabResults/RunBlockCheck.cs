using CommunityLead.Rules.Calibration;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// Checks the optional run blocks cell by cell (every problem named with its place) and, once the whole batch has
/// passed, turns them with the checked results and QC rows into the Rules' <see cref="RunInput"/>.
/// </summary>
internal sealed class RunBlockCheck(BatchProblemList problems)
{
    private const int MinimumStandards = 3;
    private const int NameMaxLength = 100;

    public void CheckRows(IReadOnlyList<ResultRow> rows, IReadOnlyList<QcRow> qc)
    {
        foreach (var row in rows)
        {
            Finite(row.Where, "intensities", row.Intensities);
            if (row.RunOrder is < 1) problems.Add(new(row.Where, "runOrder", "A position in the run starts at 1."));
        }
        foreach (var row in qc.Where(q => q.RunOrder is < 1))
            problems.Add(new(row.Where, "runOrder", "A position in the run starts at 1."));
    }

    public (List<RunCalibration> Calibrations, List<ReferenceSoil> References, List<RepeatReadings> Repeats) Check(RunBlock? run, Matrix matrix)
    {
        var calibrations = new List<RunCalibration>();
        var references = new List<ReferenceSoil>();
        var repeats = new List<RepeatReadings>();
        if (run is null) return (calibrations, references, repeats);
        foreach (var (block, i) in (run.Calibrations ?? []).Select((b, i) => (b, i)))
            if (Calibration(block ?? new(null, null, null, null, null, null, null), Place(block?.Where, $"/run/calibrations/{i}"), calibrations) is { } c)
                calibrations.Add(c);
        foreach (var (block, i) in (run.ReferenceSoils ?? []).Select((b, i) => (b, i)))
            if (Reference(block ?? new(null, null, null, null, null), Place(block?.Where, $"/run/referenceSoils/{i}")) is { } r)
                references.Add(r);
        foreach (var (block, i) in (run.Repeats ?? []).Select((b, i) => (b, i)))
            if (Repeat(block ?? new(null, null, null, null), Place(block?.Where, $"/run/repeats/{i}")) is { } r)
                repeats.Add(r);
        return (calibrations, references, repeats);
    }

    private RunCalibration? Calibration(CalibrationBlock b, string where, List<RunCalibration> earlier)
    {
        var before = problems.Count;
        void Problem(string field, string reason) => problems.Add(new(where, field, reason));
        if (!Analytes.TryParse(b.Analyte, out var analyte)) Problem("analyte", "lead (Pb) or copper (Cu).");
        else if (earlier.Any(c => c.Analyte == analyte)) Problem("analyte", "One calibration per analyte: the one the results were read on.");
        double factor = 1;
        if (problems.Count == before && !Units.TryFactor(analyte, Matrix.Water, b.Unit, out factor, out var unitError)) Problem("unit", unitError!);
        if (b.Line is { Length: > NameMaxLength }) Problem("line", $"At most {NameMaxLength} characters.");
        Weighting? weighting = b.Weighting?.Trim().ToLowerInvariant() switch
        {
            null => null,
            "none" => Weighting.None,
            "1/x" => Weighting.InverseX,
            "1/x2" or "1/x²" or "1/x^2" => Weighting.InverseXSquared,
            _ => Fail(() => Problem("weighting", "Use none, 1/x or 1/x2.")),
        };
        var standards = b.Standards ?? [];
        if (standards.Count < MinimumStandards)
            Problem("standards", $"A curve needs at least {MinimumStandards} standards (a blank and two more, or three standards).");
        var read = new List<StandardReading>();
        foreach (var (s, i) in standards.Select((s, i) => (s, i)))
        {
            var at = Place(s?.Where, $"{where}/standards/{i}");
            if (s?.Nominal is not { } nominal || !double.IsFinite(nominal) || nominal < 0)
                problems.Add(new(at, s?.Where is { Length: > 0 } ? "expected" : "nominal", "The standard's nominal concentration, zero or more."));
            else if (read.Any(r => r.Nominal == nominal * factor))
                problems.Add(new(at, "nominal", $"A standard at {nominal} is already listed; give its readings as replicates of one standard."));
            if (s?.Intensities is not { Count: > 0 }) problems.Add(new(at, "intensities", "At least one intensity reading."));
            else Finite(at, "intensities", s.Intensities);
            if (problems.Count == before) read.Add(new(s!.Nominal!.Value * factor, s.Intensities!));
        }
        Finite(where, "blankIntensities", b.BlankIntensities);
        if (problems.Count == before && read.Select(r => r.Nominal).Distinct().Count() < 2)
            Problem("standards", "The standards need at least two different concentrations.");
        if (problems.Count > before) return null;
        var model = weighting is null && b.ThroughBlank is null ? null : new CalibrationModel(b.ThroughBlank ?? false, weighting ?? Weighting.None);
        return new RunCalibration(analyte, b.Line?.Trim(), model, read, b.BlankIntensities ?? []);
    }

    private ReferenceSoil? Reference(ReferenceSoilBlock b, string where)
    {
        var before = problems.Count;
        if (string.IsNullOrWhiteSpace(b.Name) || b.Name.Length > NameMaxLength)
            problems.Add(new(where, "name", $"Name the reference soil (for example its SRM number), at most {NameMaxLength} characters."));
        double factor = 1;
        if (!Units.TryFactor(Analyte.Lead, Matrix.Soil, b.Unit, out factor, out var unitError)) problems.Add(new(where, "unit", unitError!));
        if (b.Certified is not > 0) problems.Add(new(where, "certified", "The certificate's lead value, above zero."));
        if (b.CertifiedUncertainty is < 0) problems.Add(new(where, "certifiedUncertainty", "Cannot be negative."));
        var readings = Readings(b.Readings, where, 1);
        if (problems.Count > before) return null;
        return new ReferenceSoil(b.Name!.Trim(), b.Certified!.Value * factor, b.CertifiedUncertainty * factor,
            [.. readings.Select(r => new XrfReading(r.Value * factor, r.Sigma * factor))]);
    }

    private RepeatReadings? Repeat(RepeatBlock b, string where)
    {
        var before = problems.Count;
        var code = KitCode.Parse(b.KitCode);
        if (!code.IsValid) problems.Add(new(where, "kitCode", code.Error!));
        if (b.Location is { Length: > NameMaxLength }) problems.Add(new(where, "location", $"At most {NameMaxLength} characters."));
        double factor = 1;
        if (!Units.TryFactor(Analyte.Lead, Matrix.Soil, b.Unit, out factor, out var unitError)) problems.Add(new(where, "unit", unitError!));
        var readings = Readings(b.Readings, where, 2);
        if (problems.Count > before) return null;
        var label = b.Location is { Length: > 0 } location ? $"{code.Code} {location.Trim()}" : code.Code!;
        return new RepeatReadings(label, [.. readings.Select(r => new XrfReading(r.Value * factor, r.Sigma * factor))]);
    }

    private List<XrfReading> Readings(IReadOnlyList<XrfReadingBlock>? readings, string where, int minimum)
    {
        var list = readings ?? [];
        if (list.Count < minimum) problems.Add(new(where, "readings", minimum == 1 ? "At least one reading." : $"At least {minimum} readings."));
        var good = new List<XrfReading>();
        foreach (var (r, i) in list.Select((r, i) => (r, i)))
        {
            var at = Place(r?.Where, $"{where}/readings/{i}");
            var before = problems.Count;
            if (r?.Value is not { } value || !double.IsFinite(value) || value < 0)
                problems.Add(new(at, r?.Where is { Length: > 0 } ? "measured" : "value", "The reading, zero or more."));
            if (r?.Sigma is not { } sigma || !double.IsFinite(sigma) || sigma <= 0)
                problems.Add(new(at, r?.Where is { Length: > 0 } ? "uncertainty" : "sigma", "The reading's one-sigma uncertainty, above zero."));
            if (problems.Count == before) good.Add(new(r!.Value!.Value, r.Sigma!.Value));
        }
        return good;
    }

    private void Finite(string where, string field, IReadOnlyList<double>? values)
    {
        if (values is not null && values.Any(v => !double.IsFinite(v))) problems.Add(new(where, field, "Every reading must be a number."));
    }

    /// <summary>A CSV row keeps its own line; a JSON block gets its pointer.</summary>
    private static string Place(string? where, string pointer) => where is { Length: > 0 } ? where : pointer;

    private static Weighting? Fail(Action problem)
    {
        problem();
        return null;
    }
}
