using CommunityLead.Rules.LabResults;

namespace CommunityLead.Rules.Calibration;

/// <summary>
/// The lab's own run, checked and in the results' normal unit (concentrations) or counts (intensities). Stored with
/// the batch so that the QC report can draw it later.
/// </summary>
public sealed record RunInput(
    IReadOnlyList<RunCalibration> Calibrations,
    IReadOnlyList<RunSample> Samples,
    IReadOnlyList<RunQcPoint> Sequence,
    IReadOnlyList<ReferenceSoil> ReferenceSoils,
    IReadOnlyList<RepeatReadings> Repeats);

/// <param name="Line">The wavelength or mass read, as the lab names it ("Pb 220.353", "208Pb").</param>
/// <param name="Model">Null: the service's setting.</param>
public sealed record RunCalibration(Analyte Analyte, string? Line, CalibrationModel? Model, IReadOnlyList<StandardReading> Standards,
    IReadOnlyList<double> BlankIntensities);

/// <param name="Label">How a person finds the sample: kit code and bottle.</param>
public sealed record RunSample(string Label, Analyte Analyte, double Reported, bool Censored, double Mdl, double ReportingLimit,
    IReadOnlyList<double>? Intensities, int? RunOrder);

/// <summary>A calibration check or blank in the run; <paramref name="RunOrder"/> is its position in the sequence.</summary>
public sealed record RunQcPoint(QcType Type, Analyte Analyte, int? RunOrder, double? Expected, double? Measured);

public sealed record XrfReading(double Value, double Sigma);

public sealed record ReferenceSoil(string Name, double Certified, double? CertifiedUncertainty, IReadOnlyList<XrfReading> Readings);

public sealed record RepeatReadings(string Label, IReadOnlyList<XrfReading> Readings);
