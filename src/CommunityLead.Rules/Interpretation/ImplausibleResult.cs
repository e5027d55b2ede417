using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public enum ImplausibleReason
{
    /// <summary>Lead or copper in water above what tap water is likely to hold: most often a unit mix-up (ppm for ppb).</summary>
    AboveTapWaterRange,
    /// <summary>A flushed sample far above its first draw and at or above the action level: the bottles may be swapped.</summary>
    FlushedFarAboveFirstDraw,
    /// <summary>A soil reading above what the instrument reads reliably.</summary>
    OutsideInstrumentRange,
    /// <summary>A value below zero: no concentration is.</summary>
    Negative,
}

/// <summary>One result to check with the lab before a letter goes out, with what it was compared with.</summary>
/// <param name="Value">The result in <paramref name="Unit"/> (the normal unit: lead µg/L, copper mg/L, soil mg/kg).</param>
/// <param name="Limit">The figure it crossed, in <paramref name="Unit"/>: the setting, or for a flushed sample the action level.</param>
/// <param name="FirstDraw">For a flushed sample: the first draw's lead (its reporting limit when not detected).</param>
/// <param name="Factor">For a flushed sample: how many times the first draw counts as far above it (a setting).</param>
public sealed record ImplausibleResult(
    ImplausibleReason Reason,
    BottleType Bottle,
    int? Position,
    SoilLocation? Location,
    Analyte Analyte,
    double Value,
    string Unit,
    double Limit,
    double? FirstDraw = null,
    bool FirstDrawBelowReportingLimit = false,
    double? Factor = null);
