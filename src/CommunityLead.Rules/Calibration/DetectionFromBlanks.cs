namespace CommunityLead.Rules.Calibration;

/// <summary>
/// Limits of detection and quantitation from replicate blank intensities, converted to concentration by the
/// calibration slope: LOD = 3·s_blank / slope, LOQ = 10·s_blank / slope [published: IUPAC; Long &amp; Winefordner,
/// Anal. Chem. 55 (1983) 712A].
/// </summary>
public static class DetectionFromBlanks
{
    public const double DetectionFactor = 3;
    public const double QuantitationFactor = 10;

    public static BlankLimits? Compute(IReadOnlyList<double> blankIntensities, double slope)
    {
        if (Replicates.Sd(blankIntensities) is not { } sd || !(slope > 0)) return null;
        return new BlankLimits(blankIntensities.Count, Replicates.Mean(blankIntensities), sd,
            DetectionFactor * sd / slope, QuantitationFactor * sd / slope);
    }
}

/// <summary>Blank figures: intensities (counts) for the mean and SD, concentrations for the limits.</summary>
public sealed record BlankLimits(int Count, double MeanIntensity, double SdIntensity, double Detection, double Quantitation);
