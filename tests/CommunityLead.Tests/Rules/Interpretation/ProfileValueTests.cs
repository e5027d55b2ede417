using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Interpretation.ProfileFiles;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>Each shipped level against the value its source publishes (shared DOMAIN.md §1 and §5).</summary>
public class ProfileValueTests
{
    [Fact]
    public void UsLcri_Levels_MatchPublishedValues()
    {
        var p = Load("us-lcri");
        Assert.Equal(3, p.Levels.Count);
        Check(p, Analyte.Lead, LevelKind.ActionLevel, 10, "89 FR 86418", "published"); // 89 FR 86418 (2024-10-30): LCRI lead action level 10 µg/L [published]
        Check(p, Analyte.Copper, LevelKind.ActionLevel, 1.3, "40 CFR 141.80(c)", "published"); // 40 CFR 141.80(c): copper action level 1.3 mg/L [published]
        Check(p, Analyte.Copper, LevelKind.Aesthetic, 1.0, "40 CFR 143.3", "published"); // 40 CFR 143.3: copper secondary standard 1.0 mg/L [published]
    }

    [Fact]
    public void UsLcr_Levels_MatchPublishedValues()
    {
        var p = Load("us-lcr");
        Assert.Equal(3, p.Levels.Count);
        Check(p, Analyte.Lead, LevelKind.ActionLevel, 15, "40 CFR 141.80(c)", "published"); // 40 CFR 141.80(c), 141.2: lead action level 15 µg/L before the LCRI [published]
        Check(p, Analyte.Copper, LevelKind.ActionLevel, 1.3, "40 CFR 141.80(c)", "published"); // 40 CFR 141.80(c): copper action level 1.3 mg/L [published]
        Check(p, Analyte.Copper, LevelKind.Aesthetic, 1.0, "40 CFR 143.3", "published"); // 40 CFR 143.3: copper secondary standard 1.0 mg/L [published]
    }

    [Fact]
    public void HealthCanada_Levels_MatchPublishedValues()
    {
        var p = Load("health-canada");
        Assert.Equal(2, p.Levels.Count);
        Check(p, Analyte.Lead, LevelKind.ActionLevel, 5, "Health Canada", "published"); // Health Canada guideline technical document, 2019-03-08: lead MAC 5 µg/L [published]
        Check(p, Analyte.Copper, LevelKind.ActionLevel, 2, "Health Canada", "memory"); // Health Canada copper MAC 2 mg/L (2019), from memory: not yet in DOMAIN.md [memory]
    }

    [Fact]
    public void Who_Levels_MatchPublishedValues()
    {
        var p = Load("who");
        Assert.Equal(2, p.Levels.Count);
        Check(p, Analyte.Lead, LevelKind.ActionLevel, 10, "WHO Guidelines for Drinking-water Quality", "published"); // WHO GDWQ: lead 10 µg/L, provisional guideline value [published]
        Check(p, Analyte.Copper, LevelKind.ActionLevel, 2, "WHO Guidelines for Drinking-water Quality", "published"); // WHO GDWQ: copper 2 mg/L guideline value [published]
    }

    [Fact]
    public void Eu20202184_Levels_MatchPublishedValues()
    {
        var p = Load("eu-2020-2184");
        Assert.Equal(3, p.Levels.Count);
        var until2036 = Check(p, Analyte.Lead, LevelKind.ActionLevel, 10, "2020/2184, Annex I Part B", "published", on: new(2036, 1, 11)); // Directive (EU) 2020/2184, Annex I Part B: lead 10 µg/L until then [published]
        var from2036 = Check(p, Analyte.Lead, LevelKind.ActionLevel, 5, "2020/2184, Annex I Part B", "published", on: new(2036, 1, 12)); // Directive (EU) 2020/2184, Annex I Part B: lead 5 µg/L from 2036-01-12 [published]
        Assert.Equal((null, new DateOnly(2036, 1, 11)), (until2036.EffectiveFrom, until2036.EffectiveUntil));
        Assert.Equal((new DateOnly(2036, 1, 12), null), (from2036.EffectiveFrom, from2036.EffectiveUntil));
        Check(p, Analyte.Copper, LevelKind.ActionLevel, 2.0, "2020/2184", "memory"); // Directive (EU) 2020/2184, Annex I Part B: copper 2.0 mg/L, from memory: not yet in DOMAIN.md [memory]
    }

    [Fact]
    public void SchoolsChildCare_Levels_MatchPublishedValues()
    {
        var p = Load("schools-child-care");
        Assert.Equal(3, p.Levels.Count);
        Check(p, Analyte.Lead, LevelKind.Advisory, 1, "Prevention of Childhood Lead Toxicity", "published"); // AAP 2016, "Prevention of Childhood Lead Toxicity": 1 ppb at school fountains [published]
        Check(p, Analyte.Lead, LevelKind.ActionLevel, 10, "89 FR 86418", "published"); // 89 FR 86418 (2024-10-30): LCRI lead action level 10 µg/L [published]
        Check(p, Analyte.Copper, LevelKind.ActionLevel, 1.3, "40 CFR 141.80(c)", "published"); // 40 CFR 141.80(c): copper action level 1.3 mg/L [published]
    }

    [Fact]
    public void UsSoilHazard_Levels_MatchPublishedValues()
    {
        var p = Load("us-soil-hazard");
        Assert.Equal(4, p.Levels.Count);
        var playArea = Soil(p, 400, "40 CFR 745.65", SoilLocation.PlayArea); // 40 CFR 745.65: 400 ppm bare soil in play areas [published]
        Assert.Equal([SoilLocation.PlayArea], playArea.AppliesTo!);
        foreach (var rest in new[] { SoilLocation.Garden, SoilLocation.DripLine, SoilLocation.Yard })
            Soil(p, 1200, "40 CFR 745.65", rest); // 40 CFR 745.65: 1,200 ppm average bare soil in the rest of the yard [published]
        // Version 2 judges every place against the EPA residential screening levels too, as soil advisories.
        Assert.Equal(2, p.Version);
        foreach (var location in Enum.GetValues<SoilLocation>())
        {
            Soil(p, 200, "EPA Updated Residential Soil Lead Guidance", location, kind: LevelKind.Advisory); // EPA soil lead guidance, 2024-01-17: 200 ppm [published]
            Soil(p, 100, "EPA Updated Residential Soil Lead Guidance", location, otherLeadSource: true, kind: LevelKind.Advisory); // EPA 2024: 100 ppm with another lead source [published]
        }
    }

    [Fact]
    public void EpaSoilScreening2024_Levels_MatchPublishedValues()
    {
        var p = Load("epa-soil-screening-2024");
        Assert.Equal(2, p.Levels.Count);
        foreach (var location in Enum.GetValues<SoilLocation>())
        {
            Soil(p, 200, "EPA Updated Residential Soil Lead Guidance", location); // EPA soil lead guidance, 2024-01-17: screening level 200 ppm [published]
            Soil(p, 100, "EPA Updated Residential Soil Lead Guidance", location, otherLeadSource: true); // EPA soil lead guidance, 2024-01-17: 100 ppm where another lead source exists [published]
        }
    }

    [Fact]
    public void Eu20202184_LeadInEffect_SwitchesFrom10To5On20360112()
    {
        var p = Load("eu-2020-2184");
        var (lead, water) = (Analyte.Lead, Matrix.Water);

        // Directive (EU) 2020/2184, Annex I Part B: 10 µg/L until 12 January 2036, then 5 µg/L [published]
        Assert.Equal([10.0], ProfileLevels.InEffect(p, lead, water, new(2036, 1, 11)).Select(l => l.Value));
        Assert.Equal([5.0], ProfileLevels.InEffect(p, lead, water, new(2036, 1, 12)).Select(l => l.Value));
        Assert.Equal([10.0], ProfileLevels.InEffect(p, lead, water, new(2026, 4, 10)).Select(l => l.Value));
    }

    private static ProfileLevel Check(
        RuleProfile p, Analyte analyte, LevelKind kind, double value, string source, string marker, DateOnly? on = null)
    {
        var level = Single(p, analyte, Matrix.Water, kind, on: on);
        Assert.Equal(value, level.Value);
        Assert.Equal(Analytes.NormalUnit(analyte, Matrix.Water), level.Unit);
        Assert.Contains(source, level.Source);
        Assert.Equal(marker, level.Marker);
        return level;
    }

    private static ProfileLevel Soil(RuleProfile p, double value, string source, SoilLocation at, bool otherLeadSource = false,
        LevelKind kind = LevelKind.SoilLevel)
    {
        var level = Single(p, Analyte.Lead, Matrix.Soil, kind, at, otherLeadSource);
        Assert.Equal(value, level.Value);
        Assert.Equal(Units.MilligramsPerKilogram, level.Unit);
        Assert.Contains(source, level.Source);
        Assert.Equal("published", level.Marker);
        return level;
    }
}
