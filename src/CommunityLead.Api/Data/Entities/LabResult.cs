using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// One analyte in one bottle, as the lab reported it and normalised (lead µg/L, copper mg/L, soil mg/kg).
/// A later version or re-analysis supersedes it; nothing is ever overwritten.
/// </summary>
public class LabResult
{
    public long Id { get; set; }
    public int LabBatchId { get; set; }
    public LabBatch? Batch { get; set; }
    public int KitId { get; set; }
    public required string KitCode { get; set; }
    public BottleType Bottle { get; set; }
    public int? Position { get; set; }
    public SoilLocation? Location { get; set; }
    public Analyte Analyte { get; set; }
    public double Value { get; set; }
    public required string Unit { get; set; }
    public double OriginalValue { get; set; }
    public required string OriginalUnit { get; set; }
    /// <summary>"&lt;" below the reporting limit (then Value is the limit), "J" estimated, or null.</summary>
    public string? Qualifier { get; set; }
    public double Mdl { get; set; }
    public double ReportingLimit { get; set; }
    /// <summary>One standard deviation, normal unit (portable XRF soil readings).</summary>
    public double? Uncertainty { get; set; }
    public string? ReplicatesJson { get; set; }
    public DateTimeOffset? AcidifiedAt { get; set; }
    /// <summary>Null while the kit's collection form has not been recorded (the results wait for it: WaitingResults).</summary>
    public DateTimeOffset? CollectedAt { get; set; }
    /// <summary>Holding-time flags as JSON (code and message, as worded when the batch came in), or null.</summary>
    public string? HoldingFlags { get; set; }
    public DateTime? SupersededAtUtc { get; set; }
}
