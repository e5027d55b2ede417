using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// A jurisdiction's levels, as data (seed-data/profiles/*.json). Versioned: an interpretation records the
/// profile id and version it used, so changing a profile later never rewrites what a household was told.
/// <see cref="SpanishName"/> ("nameEs") names it in Spanish letters, which otherwise would print the English name.
/// </summary>
public sealed record RuleProfile(
    string Id,
    int Version,
    string Name,
    string Jurisdiction,
    IReadOnlyList<ProfileLevel> Levels,
    string? Notes = null,
    string? SpanishName = null)
{
    /// <summary>The name a letter in that language prints under its results table.</summary>
    public string NameIn(bool spanish) => spanish && SpanishName is { } es ? es : Name;
}

public enum LevelKind
{
    /// <summary>The level at which action is required (e.g. US action level, a guideline or parametric value).</summary>
    ActionLevel,
    /// <summary>A stricter level a program chooses to warn at (e.g. the school 1 ppb recommendation).</summary>
    Advisory,
    /// <summary>Taste and staining, not health (copper 1.0 mg/L secondary standard).</summary>
    Aesthetic,
    /// <summary>Soil: a hazard or screening level, for the locations it applies to.</summary>
    SoilLevel,
}

/// <param name="AppliesTo">Soil locations this level is for; null or empty means every location.</param>
/// <param name="OnlyWithOtherLeadSource">Soil screening level used only where the home has another lead source.</param>
/// <param name="EffectiveFrom">First day the level applies (e.g. the EU 5 µg/L from 2036-01-12); null = always.</param>
/// <param name="Marker">How sure the value is: "published", "memory" or "practice".</param>
public sealed record ProfileLevel(
    Analyte Analyte,
    Matrix Matrix,
    LevelKind Kind,
    double Value,
    string Unit,
    string Meaning,
    string Source,
    string Marker,
    IReadOnlyList<SoilLocation>? AppliesTo = null,
    bool OnlyWithOtherLeadSource = false,
    DateOnly? EffectiveFrom = null,
    DateOnly? EffectiveUntil = null);
