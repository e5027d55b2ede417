using CommunityLead.Rules.LabResults;

namespace CommunityLead.Api.Data.Entities;

/// <summary>A QC measurement of a batch, kept so the verdict can always be recomputed and checked.</summary>
public class LabQcEntry
{
    public int Id { get; set; }
    public int LabBatchId { get; set; }
    public QcType Type { get; set; }
    public Analyte Analyte { get; set; }
    public double? Expected { get; set; }
    public double? Measured { get; set; }
    public double? Unspiked { get; set; }
    public double? SpikeAdded { get; set; }
    public double? Duplicate { get; set; }
    public required string Unit { get; set; }
}
