using System.Text.Json.Serialization;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// The lab's own run, optional in a batch: what the service needs to check the calibration itself rather than take
/// the lab's finished figures. In CSV these arrive as rows with their own sampleType (CsvRunRows).
/// </summary>
public sealed record RunBlock(
    IReadOnlyList<CalibrationBlock>? Calibrations,
    IReadOnlyList<ReferenceSoilBlock>? ReferenceSoils,
    IReadOnlyList<RepeatBlock>? Repeats);

/// <param name="Line">The wavelength or mass read ("Pb 220.353", "208Pb"); free text, shown in the report.</param>
/// <param name="Unit">Of the standards' nominal concentrations.</param>
/// <param name="Weighting">none, 1/x or 1/x2; absent: the service's setting.</param>
/// <param name="ThroughBlank">Fix the line at the blank's intensity; absent: the service's setting.</param>
/// <param name="BlankIntensities">Replicate blank readings for the detection limit; absent: the zero standard's replicates.</param>
public sealed record CalibrationBlock(
    string? Analyte,
    string? Line,
    string? Unit,
    string? Weighting,
    bool? ThroughBlank,
    IReadOnlyList<StandardBlock>? Standards,
    IReadOnlyList<double>? BlankIntensities)
{
    [JsonIgnore] public string Where { get; init; } = "";
}

public sealed record StandardBlock(double? Nominal, IReadOnlyList<double>? Intensities)
{
    [JsonIgnore] public string Where { get; init; } = "";
}

/// <summary>One reading of a portable XRF: the value and its one-sigma counting uncertainty.</summary>
public sealed record XrfReadingBlock(double? Value, double? Sigma)
{
    [JsonIgnore] public string Where { get; init; } = "";
}

/// <summary>A certified reference soil read on the XRF during the run (for example a NIST SRM), with its certificate.</summary>
public sealed record ReferenceSoilBlock(string? Name, double? Certified, double? CertifiedUncertainty, string? Unit, IReadOnlyList<XrfReadingBlock>? Readings)
{
    [JsonIgnore] public string Where { get; init; } = "";
}

/// <summary>Repeat readings of one soil cup.</summary>
public sealed record RepeatBlock(string? KitCode, string? Location, string? Unit, IReadOnlyList<XrfReadingBlock>? Readings)
{
    [JsonIgnore] public string Where { get; init; } = "";
}
