using CommunityLead.Rules.LabResults;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Settings of the "LabIntake" section. QC windows and holding times keep their sources in Rules.</summary>
public sealed class LabIntakeOptions
{
    /// <summary>Largest batch body accepted; bigger ones get 413. 50 MB holds well over 100,000 CSV rows.</summary>
    public long MaxBatchBytes { get; set; } = 50 * 1024 * 1024;

    /// <summary>
    /// A refused batch lists this many problems, and counts the rest: enough to fix a file by, small enough that a
    /// file of bad rows is answered quickly and in a few kilobytes.
    /// </summary>
    public int MaxProblemsListed { get; set; } = 200;
    public QcWindows Qc { get; set; } = new();
    public HoldingLimits Holding { get; set; } = new();
}
