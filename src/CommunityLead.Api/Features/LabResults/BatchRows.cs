using System.Text.Json.Serialization;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// A batch as the lab sent it, JSON or CSV alike. Codes, names and times stay text here so that every bad
/// cell, in either format, is reported with its row and field instead of failing the whole parse.
/// </summary>
public sealed record BatchRequest(
    string? BatchId,
    string? Method,
    string? AnalyzedAt,
    bool? Correction,
    string? CorrectionReason,
    IReadOnlyList<ResultRow>? Results,
    IReadOnlyList<QcRow>? Qc)
{
    /// <summary>Optional: the lab's own run (calibration, blank readings, XRF references and repeats), RunBlocks.cs.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] public RunBlock? Run { get; init; }
}

public sealed record ResultRow(
    string? KitCode,
    string? Bottle,
    int? Position,
    string? Location,
    string? Analyte,
    double? Value,
    string? Unit,
    string? Qualifier,
    double? Mdl,
    double? ReportingLimit,
    double? Uncertainty,
    IReadOnlyList<double>? Replicates,
    string? AcidifiedAt)
{
    /// <summary>Where the row came from: a JSON pointer ("/results/3") or a CSV line ("row 5").</summary>
    [JsonIgnore] public string Where { get; init; } = "";

    /// <summary>Cells of this row that did not parse (CSV), reported already: the checks must not also call them missing.</summary>
    [JsonIgnore] public IReadOnlyCollection<string>? Unreadable { get; init; }

    // Optional run figures; left out of the content hash when absent, so batches posted before them hash as they did.
    /// <summary>The replicate intensities (counts) behind the value, to be read through the batch's calibration.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] public IReadOnlyList<double>? Intensities { get; init; }
    /// <summary>The sample's position in the instrument's run sequence.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] public int? RunOrder { get; init; }
}

public sealed record QcRow(
    string? Type,
    string? Analyte,
    double? Expected,
    double? Measured,
    double? Unspiked,
    double? SpikeAdded,
    double? Duplicate,
    string? Unit)
{
    [JsonIgnore] public string Where { get; init; } = "";

    [JsonIgnore] public IReadOnlyCollection<string>? Unreadable { get; init; }

    /// <summary>Optional: the check's or blank's position in the run sequence.</summary>
    [JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] public int? RunOrder { get; init; }
}

/// <param name="Where">JSON pointer or "row N" (CSV line, header = line 1); empty for the batch itself.</param>
public sealed record BatchProblem(string Where, string Field, string Reason)
{
    /// <summary>The key in the problem's <c>errors</c>: "/results/3/unit", "row 5/unit", or "batchId" for the batch.</summary>
    public string Key => Where.Length == 0 ? Field : $"{Where}/{Field}";
}

/// <param name="Problems">What reading found (CSV cells, columns, query values); the checks add theirs to the same list.</param>
public sealed record ParsedBatch(BatchRequest Request, string Format, BatchProblemList Problems);
