using System.Runtime.CompilerServices;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// The run's rows in a CSV batch, gathered into the same blocks a JSON batch carries:
/// <c>calibration-standard</c> (analyte, unit, expected = nominal, intensities; line, weighting, throughBlank),
/// <c>blank-reading</c> (analyte, line, intensities), <c>xrf-reference</c> (reference, expected = certified,
/// certifiedUncertainty, unit, measured, uncertainty = one sigma) and <c>xrf-repeat</c> (kitCode, location, unit,
/// measured, uncertainty). Rows of one curve, reference or cup are grouped by analyte and line, name, or kit and location.
/// </summary>
internal sealed class CsvRunRows(BatchProblemList problems)
{
    private readonly List<(string Key, CalibrationBlock Block, List<StandardBlock> Standards, List<double> Blanks)> calibrations = [];
    private readonly List<(string Key, ReferenceSoilBlock Block, List<XrfReadingBlock> Readings)> references = [];
    private readonly List<(string Key, RepeatBlock Block, List<XrfReadingBlock> Readings)> repeats = [];

    public bool TryAdd(CsvCells cells, string sampleType)
    {
        switch (sampleType.ToLowerInvariant())
        {
            case "calibration-standard":
                Curve(cells).Standards.Add(new StandardBlock(cells.Number("expected"), cells.Numbers("intensities")) { Where = cells.Where });
                return true;
            case "blank-reading":
                Curve(cells).Blanks.AddRange(cells.Numbers("intensities") ?? []);
                return true;
            case "xrf-reference":
                var name = cells.Text("reference");
                var referenceKey = name?.ToLowerInvariant() ?? "";
                var reference = Group(references, referenceKey,
                    () => (referenceKey, new ReferenceSoilBlock(name, cells.Number("expected"), cells.Number("certifiedUncertainty"), cells.Text("unit"), null) { Where = cells.Where }, []));
                reference.Readings.Add(Reading(cells));
                return true;
            case "xrf-repeat":
                var (kit, location) = (cells.Text("kitCode"), cells.Text("location"));
                var repeatKey = $"{kit?.ToUpperInvariant()}|{location?.ToLowerInvariant()}";
                var repeat = Group(repeats, repeatKey,
                    () => (repeatKey, new RepeatBlock(kit, location, cells.Text("unit"), null) { Where = cells.Where }, []));
                repeat.Readings.Add(Reading(cells));
                return true;
            default:
                return false;
        }
    }

    public RunBlock? Block() => calibrations.Count + references.Count + repeats.Count == 0 ? null : new RunBlock(
        [.. calibrations.Select(c => c.Block with { Standards = c.Standards, BlankIntensities = c.Blanks.Count == 0 ? null : c.Blanks })],
        [.. references.Select(r => r.Block with { Readings = r.Readings })],
        [.. repeats.Select(r => r.Block with { Readings = r.Readings })]);

    private (string Key, CalibrationBlock Block, List<StandardBlock> Standards, List<double> Blanks) Curve(CsvCells cells)
    {
        var (analyte, line) = (cells.Text("analyte"), cells.Text("line"));
        var (weighting, throughBlank) = (cells.Text("weighting"), cells.Flag("throughBlank"));
        var key = $"{analyte?.ToLowerInvariant()}|{line}";
        var curve = Group(calibrations, key,
            () => (key, new CalibrationBlock(analyte, line, cells.Text("unit"), weighting, throughBlank, null, null) { Where = cells.Where }, [], []));
        // The model is the curve's, so every row that names it must name the same one.
        if (weighting is not null && !weighting.Equals(curve.Block.Weighting, StringComparison.OrdinalIgnoreCase))
            problems.Add(new(cells.Where, "weighting", $"This curve's first row ({curve.Block.Where}) says weighting '{curve.Block.Weighting}': name the model on the curve's first row, the same on any other."));
        if (throughBlank is not null && throughBlank != curve.Block.ThroughBlank)
            problems.Add(new(cells.Where, "throughBlank", $"This curve's first row ({curve.Block.Where}) says throughBlank '{curve.Block.ThroughBlank}': name the model on the curve's first row, the same on any other."));
        return curve;
    }

    private static XrfReadingBlock Reading(CsvCells cells) =>
        new(cells.Number("measured"), cells.Number("uncertainty")) { Where = cells.Where };

    private static T Group<T>(List<T> groups, string key, Func<T> create) where T : ITuple
    {
        foreach (var g in groups)
            if ((string)g[0]! == key) return g;
        var made = create();
        groups.Add(made);
        return made;
    }
}
