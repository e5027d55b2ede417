namespace CommunityLead.Rules.LabResults;

/// <summary>The quality-control samples a lab runs alongside ours in an analysis batch (EPA Methods 200.7/200.8).</summary>
public enum QcType
{
    /// <summary>A mid-level standard re-measured during the run, to show the calibration still holds.</summary>
    CalibrationCheck,
    /// <summary>Clean acidified water measured during the run, to show nothing carries over.</summary>
    CalibrationBlank,
    /// <summary>Clean water spiked with a known amount and taken through the whole method.</summary>
    FortifiedBlank,
    /// <summary>One sample measured twice, to show the lab gets the same answer again.</summary>
    Duplicate,
    /// <summary>A real sample spiked with a known amount, to show the sample itself does not distort the result.</summary>
    MatrixSpike,
}

/// <summary>
/// One QC result. All values are already in the normal unit of the analyte (<see cref="Analytes.NormalUnit"/>).
/// Which fields matter depends on the type: Expected for calibration checks and fortified blanks, Unspiked and
/// SpikeAdded for matrix spikes, Duplicate for duplicates; Measured for all.
/// </summary>
public sealed record QcSample(
    QcType Type,
    Analyte Analyte,
    double? Expected,
    double? Measured,
    double? Unspiked,
    double? SpikeAdded,
    double? Duplicate);
