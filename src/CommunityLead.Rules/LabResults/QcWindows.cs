namespace CommunityLead.Rules.LabResults;

/// <summary>
/// Acceptance windows for batch QC (DOMAIN.md §4). Every window is a setting because several defaults are
/// recalled rather than read in the method text; a lab's own quality manual may set others.
/// Recovery windows are inclusive at both ends.
/// </summary>
public sealed partial record QcWindows
{
    /// <summary>Calibration check within ±10% of its true value [memory: EPA Methods 200.7/200.8].</summary>
    public double CalibrationCheckLowPercent { get; init; } = 90;
    public double CalibrationCheckHighPercent { get; init; } = 110;

    /// <summary>Laboratory fortified blank recovery 85–115% [published: EPA Method 200.8 §9.3.2].</summary>
    public double FortifiedBlankLowPercent { get; init; } = 85;
    public double FortifiedBlankHighPercent { get; init; } = 115;

    /// <summary>Fortified matrix (matrix spike) recovery 70–130% [memory: EPA Methods 200.7/200.8].</summary>
    public double MatrixSpikeLowPercent { get; init; } = 70;
    public double MatrixSpikeHighPercent { get; init; } = 130;

    /// <summary>Duplicate relative percent difference at most 20% [practice; no single source].</summary>
    public double DuplicateMaxRpdPercent { get; init; } = 20;

    /// <summary>A calibration check after every 10 samples and at the end [published: EPA Methods 200.7/200.8].</summary>
    public int SamplesPerCalibrationCheck { get; init; } = 10;
}
