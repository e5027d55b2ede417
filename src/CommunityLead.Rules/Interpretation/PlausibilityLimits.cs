namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// Where a result stops being believable without a second look. Crossing one never changes what a result means
/// (a real 2,000 µg/L is still urgent): it flags the kit and holds its letter until a coordinator has checked the
/// figure with the lab and called the household. Bound from the "Interpretation:Plausibility" settings.
/// </summary>
public sealed record PlausibilityLimits
{
    /// <summary>
    /// Lead in tap water above this is checked first: 100 times the LCRI action level (10 µg/L, 89 FR 86418). Such
    /// values are rare at a tap, while a lab writing "ppm" for ppb multiplies a result by 1,000. The program's
    /// choice (common practice), not a published limit.
    /// </summary>
    public double LeadWaterMaxUgL { get; init; } = 1000;

    /// <summary>
    /// A flushed sample more than this many times its first draw, and at or above the action level, is checked for
    /// swapped bottles: water that ran a while usually holds less lead than water that stood. Our choice (common
    /// practice); a lead service line can make a flushed sample higher, but seldom ten times higher.
    /// </summary>
    public double FlushedOverFirstDrawFactor { get; init; } = 10;

    /// <summary>
    /// Copper in tap water above this is checked first: about 15 times the action level (1.3 mg/L, 40 CFR 141.80(c)),
    /// where a result sent in µg/L but labelled mg/L would land. Our choice (common practice).
    /// </summary>
    public double CopperWaterMaxMgL { get; init; } = 20;

    /// <summary>
    /// Soil lead above this (10 % of the soil's weight) is outside what a portable XRF reads reliably: from memory,
    /// soil calibrations (SW-846 Method 6200) end well below it. Check the instrument's stated range and set this.
    /// </summary>
    public double SoilMaxMgKg { get; init; } = 100_000;
}
