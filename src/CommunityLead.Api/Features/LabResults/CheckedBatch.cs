using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A result that passed every check, normalised to the unit results are stored in. <see cref="CollectedAt"/> is null
/// for a kit whose collection form is not recorded yet: the result waits for it (WaitingResults).
/// </summary>
public sealed record CheckedResult(
    ResultRow Row,
    int KitId,
    string KitCode,
    BottleType Bottle,
    SoilLocation? Location,
    Matrix Matrix,
    Analyte Analyte,
    double Value,
    string Unit,
    double Mdl,
    double ReportingLimit,
    double? Uncertainty,
    IReadOnlyList<double>? Replicates,
    DateTimeOffset? AcidifiedAt,
    DateTimeOffset? CollectedAt,
    IReadOnlyList<HoldingFlag> Holding)
{
    public ResultKey Key => new(KitId, Bottle, Row.Position, Location, Analyte);
}

/// <summary>One bottle's analyte in one kit: a batch reports each at most once.</summary>
public readonly record struct ResultKey(int KitId, BottleType Bottle, int? Position, SoilLocation? Location, Analyte Analyte);

public sealed record CheckedQc(QcSample Sample, string Unit);

/// <summary>What the QC verdict and a correction's completeness need of a batch's results, gathered while they were checked.</summary>
/// <param name="Restated">Every result the batch reports, with where it was (a correction must restate each result in effect).</param>
public sealed record BatchTally(int ResultCount, IReadOnlyDictionary<Analyte, int> SampleCounts,
    IReadOnlyDictionary<Analyte, double> ReportingLimits, IReadOnlyDictionary<ResultKey, string> Restated);

public sealed record CheckedBatch(
    string BatchId, string Method, DateTimeOffset AnalyzedAt, bool Correction, string? CorrectionReason,
    BatchTally Tally, CheckedResults Results, IReadOnlyList<CheckedQc> Qc)
{
    /// <summary>The lab's own run when the batch carried one (calibration, positions, XRF references), else null.</summary>
    public Rules.Calibration.RunInput? Run { get; init; }
}

/// <summary>
/// A passed batch's results, handed out a chunk at a time while they are stored: from memory for a JSON batch (read
/// whole anyway), from the spooled file for a CSV batch (<see cref="SpooledResults"/>), so that a CSV batch of any
/// size is never held whole.
/// </summary>
public abstract class CheckedResults
{
    public abstract Task ForEachChunkAsync(Func<IReadOnlyList<CheckedResult>, Task> each);
}

public sealed class HeldResults(IReadOnlyList<CheckedResult> rows) : CheckedResults
{
    public override async Task ForEachChunkAsync(Func<IReadOnlyList<CheckedResult>, Task> each)
    {
        foreach (var chunk in rows.Chunk(BatchChecker.ChunkSize)) await each(chunk);
    }
}
