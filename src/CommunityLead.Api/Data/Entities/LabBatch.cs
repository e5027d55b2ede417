namespace CommunityLead.Api.Data.Entities;

public enum BatchStatus
{
    /// <summary>QC passed: the results are in effect.</summary>
    Accepted,
    /// <summary>QC failed: kept, but the results reach neither interpretation nor letters.</summary>
    Held,
    /// <summary>Held, then released by a coordinator with a reason.</summary>
    Released,
}

/// <summary>
/// One version of a lab's batch. The lab's own id plus a version number: a correction is a new version,
/// never an edit, so every figure the lab ever sent stays on record.
/// </summary>
public class LabBatch
{
    public int Id { get; set; }
    public required string BatchId { get; set; }
    public int Version { get; set; }
    public string? CorrectionReason { get; set; }
    public required string Method { get; set; }
    public DateTimeOffset AnalyzedAt { get; set; }
    public DateTime AnalyzedAtUtc { get; set; }
    /// <summary>SHA-256 of the batch's normalised content: the same batch posted twice is recognised.</summary>
    public required string ContentHash { get; set; }
    public required string Format { get; set; }
    public BatchStatus Status { get; set; }
    /// <summary>The QC verdict as computed at intake, every figure with its window (JSON).</summary>
    public required string QcJson { get; set; }
    /// <summary>The lab's own run (calibration, positions, XRF references) as checked, JSON; null when the batch had none.</summary>
    public string? RunJson { get; set; }
    public int ResultCount { get; set; }
    public required string PostedBy { get; set; }
    public DateTime PostedAtUtc { get; set; }
    public string? ReleasedBy { get; set; }
    public DateTime? ReleasedAtUtc { get; set; }
    public string? ReleaseReason { get; set; }
    public List<LabResult> Results { get; set; } = [];
    public List<LabQcEntry> Qc { get; set; } = [];

    public bool InEffect => Status is BatchStatus.Accepted or BatchStatus.Released;
}
