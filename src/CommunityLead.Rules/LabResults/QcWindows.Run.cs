using CommunityLead.Rules.Calibration;

namespace CommunityLead.Rules.LabResults;

/// <summary>Windows for the lab's own run (calibration, replicates, blanks, XRF references), DOMAIN.md §8.</summary>
public sealed partial record QcWindows
{
    /// <summary>Calibration correlation coefficient r at least 0.995 [memory: Standard Methods 3020].</summary>
    public double MinCorrelation { get; init; } = 0.995;

    /// <summary>Each standard read back through the curve within ±10% of nominal [practice].</summary>
    public double BackCalculatedPercent { get; init; } = 10;

    /// <summary>The lowest standard above the blank within ±30% [practice]: near the limit noise is a larger share.</summary>
    public double BackCalculatedLowestPercent { get; init; } = 30;

    /// <summary>Replicate relative standard deviation at most 10%, away from the detection limit [practice].</summary>
    public double MaxReplicateRsdPercent { get; init; } = 10;

    /// <summary>
    /// The service's concentration from the lab's intensities may differ from the reported one by this much
    /// [our default; no published rule]: the same curve should give the same answer, so a larger gap means the
    /// reported value came from another curve, a dilution not stated, or a figure copied wrongly.
    /// </summary>
    public double MaxComputedDifferencePercent { get; init; } = 10;

    /// <summary>
    /// The blank-derived detection limit may be at most this multiple of the MDL the lab reports [our default; no
    /// published rule]: 3·s of blanks and the 40 CFR 136 MDL (≈ 3.14·s of spikes) estimate similar things.
    /// </summary>
    public double MaxDetectionLimitOverMdl { get; init; } = 2;

    /// <summary>Blanks may drift (last minus first in run order) by at most this fraction of the reporting limit [our default].</summary>
    public double MaxBlankDriftOfReportingLimit { get; init; } = 0.5;

    /// <summary>Certified reference soil read by XRF within 80–120% of its certified lead value [memory].</summary>
    public double ReferenceSoilLowPercent { get; init; } = 80;
    public double ReferenceSoilHighPercent { get; init; } = 120;

    /// <summary>
    /// Repeat XRF readings of one cup agree when any two differ by at most this many combined one-sigma
    /// uncertainties, k·√(σ₁² + σ₂²) [practice: counting statistics; k = 2 is about 95%].
    /// </summary>
    public double RepeatAgreementSigmas { get; init; } = 2;

    /// <summary>The fit every calibration uses unless the batch names another [practice: unweighted, blank fitted].</summary>
    public Weighting CalibrationWeighting { get; init; } = Weighting.None;
    public bool CalibrationThroughBlank { get; init; }
}
