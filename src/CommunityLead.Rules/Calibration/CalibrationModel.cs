namespace CommunityLead.Rules.Calibration;

/// <summary>How standards are weighted in the fit. Low standards carry less absolute noise, so 1/x or 1/x² keeps
/// the high standards from dictating the curve near the reporting limit [practice].</summary>
public enum Weighting
{
    None,
    InverseX,
    InverseXSquared,
}

/// <summary>
/// A straight line of intensity on concentration. <paramref name="ThroughBlank"/> fixes the intercept at the blank's
/// mean intensity instead of fitting it (some instrument software subtracts the blank and forces the line through it).
/// </summary>
public sealed record CalibrationModel(bool ThroughBlank = false, Weighting Weighting = Weighting.None);
