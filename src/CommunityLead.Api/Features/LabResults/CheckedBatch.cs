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
    IReadOnlyList<HoldingFlag> Holding);

public sealed record CheckedQc(QcSample Sample, string Unit);

public sealed record CheckedBatch(
    string BatchId, string Method, DateTimeOffset AnalyzedAt, bool Correction, string? CorrectionReason,
    IReadOnlyList<CheckedResult> Results, IReadOnlyList<CheckedQc> Qc)
{
    /// <summary>The lab's own run when the batch carried one (calibration, positions, XRF references), else null.</summary>
    public Rules.Calibration.RunInput? Run { get; init; }
}
