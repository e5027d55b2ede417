using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Calibration;
using CommunityLead.Rules.LabResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Puts a passed batch's run together for the Rules: checked blocks, results with their intensities, QC with positions.</summary>
internal static class RunAssembly
{
    /// <param name="anySampleFigures">Whether any passed result carried run figures (intensities or a run position).</param>
    /// <param name="results">The passed results, read again only when there is a run: its samples are all of them.</param>
    /// <param name="qcRows">The QC rows as sent; with no problems left, each one gave exactly one of <paramref name="qc"/>, in order.</param>
    public static async Task<RunInput?> AssembleAsync(bool anySampleFigures, CheckedResults results, IReadOnlyList<QcRow> qcRows,
        IReadOnlyList<CheckedQc> qc, List<RunCalibration> calibrations, List<ReferenceSoil> references, List<RepeatReadings> repeats)
    {
        var sequence = qc.Zip(qcRows)
            .Where(p => p.First.Sample.Type is QcType.CalibrationCheck or QcType.CalibrationBlank)
            .Select(p => new RunQcPoint(p.First.Sample.Type, p.First.Sample.Analyte, p.Second.RunOrder, p.First.Sample.Expected, p.First.Sample.Measured))
            .ToList();
        // A batch with none of the run's figures keeps no run: the report has nothing to draw. Most batches (and the
        // largest) have none, so the samples are gathered only once a run is known to be there.
        var nothing = calibrations.Count == 0 && references.Count == 0 && repeats.Count == 0
            && sequence.All(p => p.RunOrder is null) && !anySampleFigures;
        if (nothing) return null;
        var samples = new List<RunSample>();
        await results.ForEachChunkAsync(chunk =>
        {
            samples.AddRange(chunk.Select(Sample));
            return Task.CompletedTask;
        });
        return new RunInput(calibrations, samples, sequence, references, repeats);
    }

    private static RunSample Sample(CheckedResult r) =>
        new(Label(r), r.Analyte, r.Value, r.Row.Qualifier?.Trim() == "<", r.Mdl, r.ReportingLimit, r.Row.Intensities, r.Row.RunOrder);

    /// <summary>Kit code and bottle, as on the lab's own sheet: "BCV-4K7Q first-draw", "BCV-… sequential 3", "BCV-… soil drip-line".</summary>
    private static string Label(CheckedResult r) =>
        $"{r.KitCode} {KebabEnum.Name(r.Bottle)}{(r.Row.Position is { } p ? $" {p}" : "")}{(r.Location is { } l ? $" {KebabEnum.Name(l)}" : "")}";
}
