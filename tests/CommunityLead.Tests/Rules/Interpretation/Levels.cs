using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Rules.Interpretation.LevelKind;
using static CommunityLead.Rules.LabResults.Analyte;
using static CommunityLead.Rules.LabResults.Matrix;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>
/// Rule profiles built in code for the interpreter's tests, each level with its published source beside it
/// (values from DOMAIN.md §1 and §5, all marked published there).
/// </summary>
internal static class Levels
{
    private const string UgL = Units.MicrogramsPerLiter;

    private static ProfileLevel Level(Analyte analyte, Matrix matrix, LevelKind kind, double value, string unit, string meaning,
        string source, DateOnly? from = null, DateOnly? until = null, SoilLocation[]? appliesTo = null, bool otherSource = false) =>
        new(analyte, matrix, kind, value, unit, meaning, source, "published", appliesTo, otherSource, from, until);

    // Lead 10 µg/L action level: Lead and Copper Rule Improvements, 89 FR 86418 (2024-10-30).
    // Copper 1.3 mg/L action level: 40 CFR 141.80(c). Copper 1.0 mg/L secondary (taste, staining): 40 CFR 143.3.
    public static readonly RuleProfile UsLcri = new("us-lcri", 1, "US federal (LCRI)", "US",
    [
        Level(Lead, Water, ActionLevel, 10, UgL, "US action level (LCRI)", "89 FR 86418"),
        Level(Copper, Water, ActionLevel, 1.3, "mg/L", "US action level", "40 CFR 141.80(c)"),
        Level(Copper, Water, Aesthetic, 1.0, "mg/L", "Secondary standard: taste and staining", "40 CFR 143.3"),
    ]);

    // Lead 15 µg/L until the LCRI compliance date (40 CFR 141.80(c)), then 10 µg/L from 2027-11-01 (89 FR 86418).
    public static readonly RuleProfile UsLcrThenLcri = new("us-federal", 1, "US federal", "US",
    [
        Level(Lead, Water, ActionLevel, 15, UgL, "US action level (LCR)", "40 CFR 141.80(c)", until: new(2027, 10, 31)),
        Level(Lead, Water, ActionLevel, 10, UgL, "US action level (LCRI)", "89 FR 86418", from: new(2027, 11, 1)),
    ]);

    // Lead 5 µg/L maximum acceptable concentration: Health Canada guideline technical document, 2019-03-08.
    public static readonly RuleProfile HealthCanada = new("health-canada", 1, "Health Canada", "CA",
        [Level(Lead, Water, ActionLevel, 5, UgL, "Maximum acceptable concentration", "Health Canada, 2019-03-08")]);

    // Lead 10 µg/L, 5 µg/L from 2036-01-12: Directive (EU) 2020/2184, Annex I Part B.
    public static readonly RuleProfile Eu = new("eu-2020-2184", 1, "EU drinking water directive", "EU",
    [
        Level(Lead, Water, ActionLevel, 10, UgL, "Parametric value", "Directive (EU) 2020/2184 Annex I Part B", until: new(2036, 1, 11)),
        Level(Lead, Water, ActionLevel, 5, UgL, "Parametric value from 2036-01-12", "Directive (EU) 2020/2184 Annex I Part B", from: new(2036, 1, 12)),
    ]);

    // Schools and child care: 1 ppb recommended maximum (American Academy of Pediatrics, "Prevention of Childhood
    // Lead Toxicity", 2016) as an advisory over the LCRI 10 µg/L action level (89 FR 86418).
    public static readonly RuleProfile Schools = new("schools", 1, "Schools and child care", "US",
    [
        Level(Lead, Water, Advisory, 1, UgL, "AAP recommended maximum for school fountains", "AAP 2016"),
        Level(Lead, Water, ActionLevel, 10, UgL, "US action level (LCRI)", "89 FR 86418"),
    ]);

    // Soil-lead hazard: 400 ppm bare soil in children's play areas, 1,200 ppm in the rest of the yard (40 CFR 745.65).
    public static readonly RuleProfile SoilHazard = new("soil-745-65", 1, "Soil-lead hazard", "US",
    [
        Level(Lead, Soil, SoilLevel, 400, "mg/kg", "Soil-lead hazard, play area", "40 CFR 745.65", appliesTo: [SoilLocation.PlayArea]),
        Level(Lead, Soil, SoilLevel, 1200, "mg/kg", "Soil-lead hazard, rest of yard", "40 CFR 745.65",
            appliesTo: [SoilLocation.Garden, SoilLocation.DripLine, SoilLocation.Yard]),
    ]);

    // Residential screening: 200 ppm; 100 ppm where another lead source exists (EPA Updated Residential Soil Lead
    // Guidance, 2024-01-17).
    public static readonly RuleProfile SoilScreening = new("soil-epa-2024", 1, "EPA soil screening", "US",
    [
        Level(Lead, Soil, SoilLevel, 200, "mg/kg", "Residential screening level", "EPA 2024 soil lead guidance"),
        Level(Lead, Soil, SoilLevel, 100, "mg/kg", "Screening level, another lead source", "EPA 2024 soil lead guidance", otherSource: true),
    ]);

    // Lead 10 µg/L (89 FR 86418) and, for copper, only the 1.0 mg/L secondary standard (40 CFR 143.3): a copper
    // result below it is below "our level", which is not an action level.
    public static readonly RuleProfile CopperTasteOnly = new("copper-taste-only", 1, "Lead action level, copper taste level", "US",
    [
        Level(Lead, Water, ActionLevel, 10, UgL, "US action level (LCRI)", "89 FR 86418"),
        Level(Copper, Water, Aesthetic, 1.0, "mg/L", "Secondary standard: taste and staining", "40 CFR 143.3"),
    ]);

    // Both, as the shipped us-soil-hazard v2 holds them: the hazard standards (40 CFR 745.65) as soil levels and the
    // EPA 2024 residential screening levels (200 ppm; 100 ppm with another lead source) as soil advisories.
    public static readonly RuleProfile SoilHazardAndScreening = new("soil-745-65-epa-2024", 1, "Soil-lead hazard and EPA screening", "US",
    [
        .. SoilHazard.Levels,
        Level(Lead, Soil, Advisory, 200, "mg/kg", "Residential screening level", "EPA 2024 soil lead guidance"),
        Level(Lead, Soil, Advisory, 100, "mg/kg", "Screening level, another lead source", "EPA 2024 soil lead guidance", otherSource: true),
    ]);
}
