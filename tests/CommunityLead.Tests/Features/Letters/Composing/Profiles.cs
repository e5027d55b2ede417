using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>Rule profiles built in code for the letter tests, each level with its published source (DOMAIN.md §1, §5).</summary>
internal static class Profiles
{
    private static ProfileLevel Level(Analyte analyte, Matrix matrix, LevelKind kind, double value, string unit, string source,
        SoilLocation[]? appliesTo = null, bool otherSource = false) =>
        new(analyte, matrix, kind, value, unit, "A level for the letter tests.", source, "published", appliesTo, otherSource);

    // Lead 10 µg/L action level: Lead and Copper Rule Improvements, 89 FR 86418 (2024-10-30).
    // Copper 1.3 mg/L action level: 40 CFR 141.80(c); copper 1.0 mg/L secondary standard (taste, staining): 40 CFR 143.3.
    public static readonly RuleProfile UsLcri = new("us-lcri", 1, "US federal, Lead and Copper Rule Improvements", "US",
    [
        Level(Analyte.Lead, Matrix.Water, LevelKind.ActionLevel, 10, Units.MicrogramsPerLiter, "89 FR 86418"),
        Level(Analyte.Copper, Matrix.Water, LevelKind.ActionLevel, 1.3, Units.MilligramsPerLiter, "40 CFR 141.80(c)"),
        Level(Analyte.Copper, Matrix.Water, LevelKind.Aesthetic, 1.0, Units.MilligramsPerLiter, "40 CFR 143.3"),
    ]);

    // Lead 15 µg/L action level of the Lead and Copper Rule, until the LCRI compliance date: 40 CFR 141.80(c).
    public static readonly RuleProfile UsLcr = new("us-lcr", 1, "US federal, Lead and Copper Rule", "US",
    [
        Level(Analyte.Lead, Matrix.Water, LevelKind.ActionLevel, 15, Units.MicrogramsPerLiter, "40 CFR 141.80(c)"),
    ]);

    // Schools: 1 ppb recommended maximum (American Academy of Pediatrics, "Prevention of Childhood Lead Toxicity",
    // 2016) as an advisory over the LCRI 10 µg/L action level (89 FR 86418).
    public static readonly RuleProfile Schools = new("schools-child-care", 1, "Schools and child care (AAP advisory on US federal levels)", "US",
    [
        Level(Analyte.Lead, Matrix.Water, LevelKind.Advisory, 1, Units.MicrogramsPerLiter, "AAP 2016"),
        Level(Analyte.Lead, Matrix.Water, LevelKind.ActionLevel, 10, Units.MicrogramsPerLiter, "89 FR 86418"),
    ]);

    // Soil-lead hazard: 400 ppm bare soil in play areas, 1,200 ppm in the rest of the yard (40 CFR 745.65).
    public static readonly RuleProfile SoilHazard = new("us-soil-hazard", 1, "US federal soil-lead hazard standards", "US",
    [
        Level(Analyte.Lead, Matrix.Soil, LevelKind.SoilLevel, 400, Units.MilligramsPerKilogram, "40 CFR 745.65", [SoilLocation.PlayArea]),
        Level(Analyte.Lead, Matrix.Soil, LevelKind.SoilLevel, 1200, Units.MilligramsPerKilogram, "40 CFR 745.65",
            [SoilLocation.Garden, SoilLocation.DripLine, SoilLocation.Yard]),
    ]);

    // The shipped us-soil-hazard v2: the hazard standards above plus EPA's residential screening levels (EPA Updated
    // Residential Soil Lead Guidance, 2024-01-17: 200 ppm; 100 ppm where the home has another lead source).
    public static readonly RuleProfile SoilHazardAndScreening = SoilHazard with
    {
        Version = 2,
        Levels =
        [
            .. SoilHazard.Levels,
            Level(Analyte.Lead, Matrix.Soil, LevelKind.Advisory, 200, Units.MilligramsPerKilogram, "EPA 2024 soil lead guidance"),
            Level(Analyte.Lead, Matrix.Soil, LevelKind.Advisory, 100, Units.MilligramsPerKilogram, "EPA 2024 soil lead guidance", otherSource: true),
        ],
    };
}
