using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>What the lab gets back for a batch version: the status and every QC figure with its window.</summary>
public sealed record BatchOutcome(
    string BatchId,
    int Version,
    BatchStatus Status,
    string Method,
    DateTimeOffset AnalyzedAt,
    int ResultCount,
    QcVerdict Qc,
    IReadOnlyList<ResultFlag> Flags,
    string? CorrectionReason,
    DateTime PostedAt,
    string PostedBy,
    BatchRelease? Release);

/// <param name="Reason">The coordinator's reason; left out of the lab's views.</param>
public sealed record BatchRelease(DateTime At, string By,
    [property: System.Text.Json.Serialization.JsonIgnore(Condition = System.Text.Json.Serialization.JsonIgnoreCondition.WhenWritingNull)] string? Reason);

/// <summary>A result kept but flagged, e.g. analyzed outside its holding time.</summary>
public sealed record ResultFlag(string KitCode, BottleType Bottle, int? Position, SoilLocation? Location, Analyte Analyte, string Code, string Message);

public sealed record BatchDetail(BatchOutcome Current, IReadOnlyList<BatchVersion> Versions, IReadOnlyList<ResultView> Results);

public sealed record BatchVersion(int Version, BatchStatus Status, DateTime PostedAt, string PostedBy, string? CorrectionReason, string ContentHash);

/// <summary>A stored result: normalised and as the lab sent it. Kit codes only, never household data.</summary>
public sealed record ResultView(
    string KitCode, BottleType Bottle, int? Position, SoilLocation? Location, Analyte Analyte,
    double Value, string Unit, double OriginalValue, string OriginalUnit, string? Qualifier, double Mdl, double ReportingLimit,
    double? Uncertainty, IReadOnlyList<double>? Replicates, IReadOnlyList<string> HoldingFlags, bool Current);

public sealed record BatchListItem(string BatchId, int Version, BatchStatus Status, string Method, DateTimeOffset AnalyzedAt, int ResultCount, bool QcPassed, DateTime PostedAt);

public sealed record BatchList(IReadOnlyList<BatchListItem> Items, int Page, int PageSize, int Total);

public sealed record ReleaseRequest(string? Reason);
