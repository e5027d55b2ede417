using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Interpretation.Kit;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>Just below, equal to and just above every level: a value equal to a level is "at or above" it.</summary>
public class InterpreterBoundaryTests
{
    private static Finding Only(KitFacts kit, RuleProfile? profile = null, ProgramRules? program = null) =>
        Assert.Single(Interpret(kit, profile, program).Findings);

    // Lead action level 10 µg/L under the LCRI (89 FR 86418).
    [Theory]
    [InlineData(9.99, Band.Low)]
    [InlineData(10, Band.Action)]
    [InlineData(10.01, Band.Action)]
    public void LeadActionLevel_Edges(double value, Band expected)
    {
        var finding = Only(Water(First(value)));
        Assert.Equal(expected, finding.Band);
        Assert.Equal(10, finding.LevelValue);
    }

    [Fact]
    public void LeadActionLevel_ConversionNoise_CountsAsEqual()
    {
        // 0.010 mg/L stored as µg/L may come out a hair under 10; within 1e-9 relative it is "equal".
        Assert.Equal(Band.Action, Only(Water(First(10 - 1e-12))).Band);
        Assert.Equal(Band.Low, Only(Water(First(9.9999))).Band);
    }

    // Lead action level 15 µg/L before the LCRI compliance date (40 CFR 141.80(c)); 10 from 2027-11-01 (89 FR 86418).
    [Theory]
    [InlineData("2027-10-31", 14.99, Band.Low)]
    [InlineData("2027-10-31", 15, Band.Action)]
    [InlineData("2027-11-01", 9.99, Band.Low)]
    [InlineData("2027-11-01", 10, Band.Action)]
    public void LeadActionLevel_ChangesOnTheComplianceDate(string day, double value, Band expected)
    {
        var kit = Water(First(value)) with { CollectedOn = DateOnly.Parse(day) };
        Assert.Equal(expected, Only(kit, Levels.UsLcrThenLcri).Band);
    }

    // A program advisory (a setting) below the action level.
    [Theory]
    [InlineData(4.99, Band.Low)]
    [InlineData(5, Band.Advisory)]
    [InlineData(5.01, Band.Advisory)]
    [InlineData(9.99, Band.Advisory)]
    public void ProgramAdvisory_Edges(double value, Band expected)
    {
        var finding = Only(Water(First(value)), program: new ProgramRules(AdvisoryLeadUgL: 5));
        Assert.Equal(expected, finding.Band);
        // Reached: the advisory it reached; below it: the action level (89 FR 86418), named in the letter's sentence.
        Assert.Equal(expected == Band.Low ? 10 : 5, finding.LevelValue);
    }

    // Profile advisory: 1 ppb for school fountains (AAP 2016).
    [Theory]
    [InlineData(0.99, Band.Low)]
    [InlineData(1, Band.Advisory)]
    [InlineData(1.01, Band.Advisory)]
    public void ProfileAdvisory_Edges(double value, Band expected) =>
        Assert.Equal(expected, Only(Water(First(value)), Levels.Schools).Band);

    [Fact]
    public void Advisory_ProgramAndProfile_TheStricterCounts()
    {
        var finding = Only(Water(First(2)), Levels.Schools, new ProgramRules(AdvisoryLeadUgL: 5));
        Assert.Equal((Band.Advisory, 1.0), (finding.Band, finding.LevelValue));
    }

    // Urgent: a program setting, 50 µg/L by default.
    [Theory]
    [InlineData(49.99, Band.Action)]
    [InlineData(50, Band.Urgent)]
    [InlineData(50.01, Band.Urgent)]
    public void Urgent_Edges(double value, Band expected) => Assert.Equal(expected, Only(Water(First(value))).Band);

    [Fact]
    public void Urgent_ProgramSetting_IsUsed() =>
        Assert.Equal(Band.Urgent, Only(Water(First(40)), program: new ProgramRules(UrgentLeadUgL: 40)).Band);

    // Copper: action level 1.3 mg/L (40 CFR 141.80(c)); taste and staining 1.0 mg/L (40 CFR 143.3).
    [Theory]
    // Below every level, a detected result is compared with the action level: its letter says "below the action level".
    [InlineData(0.99, Band.Low, 1.3)]
    [InlineData(1.0, Band.Advisory, 1.0)]
    [InlineData(1.01, Band.Advisory, 1.0)]
    [InlineData(1.29, Band.Advisory, 1.0)]
    [InlineData(1.3, Band.Action, 1.3)]
    [InlineData(1.31, Band.Action, 1.3)]
    public void Copper_Edges(double value, Band expected, double level)
    {
        var finding = Only(Water(Copper(value)));
        Assert.Equal((expected, level), (finding.Band, finding.LevelValue));
    }

    [Fact]
    public void Copper_NeverUrgent() => Assert.Equal(Band.Action, Only(Water(Copper(60))).Band);

    // Soil-lead hazard 400 ppm in play areas (40 CFR 745.65); without an uncertainty the value is compared directly.
    [Theory]
    [InlineData(399.9, SoilComparison.Below, Band.Low)]
    [InlineData(400, SoilComparison.Above, Band.Action)]
    [InlineData(400.1, SoilComparison.Above, Band.Action)]
    public void Soil400_NoUncertainty_Edges(double value, SoilComparison comparison, Band band)
    {
        var finding = Only(SoilKit(Home(), Soil(SoilLocation.PlayArea, value)), Levels.SoilHazard);
        Assert.Equal((comparison, band, 400.0), (finding.Soil, finding.Band, finding.LevelValue));
    }

    // With σ = 10: above only if value − 2σ > 400, below only if value + 2σ < 400 (DOMAIN.md §5, practice).
    [Theory]
    [InlineData(379.9, SoilComparison.Below, Band.Low)]
    [InlineData(380, SoilComparison.Inconclusive, Band.Advisory)]
    [InlineData(400, SoilComparison.Inconclusive, Band.Advisory)]
    [InlineData(420, SoilComparison.Inconclusive, Band.Advisory)]
    [InlineData(420.1, SoilComparison.Above, Band.Action)]
    public void Soil400_WithUncertainty_TwoSigmaEdges(double value, SoilComparison comparison, Band band)
    {
        var finding = Only(SoilKit(Home(), Soil(SoilLocation.PlayArea, value, sigma: 10)), Levels.SoilHazard);
        Assert.Equal((comparison, band), (finding.Soil, finding.Band));
    }

    [Fact]
    public void Soil_ZeroUncertainty_ComparesDirectly() =>
        Assert.Equal(SoilComparison.Above, Only(SoilKit(Home(), Soil(SoilLocation.PlayArea, 400, sigma: 0)), Levels.SoilHazard).Soil);

    // 1,200 ppm for the rest of the yard (40 CFR 745.65).
    [Theory]
    [InlineData(1199, Band.Low)]
    [InlineData(1200, Band.Action)]
    public void Soil1200_Yard_Edges(double value, Band band) =>
        Assert.Equal(band, Only(SoilKit(Home(), Soil(SoilLocation.Yard, value)), Levels.SoilHazard).Band);

    [Fact]
    public void ReportingLimit_BelowIt_IsNotDetected_AtIt_IsMeasured()
    {
        Assert.Equal(Band.NotDetected, Only(Water(NotDetected(BottleType.FirstDraw, reportingLimit: 1))).Band);
        Assert.Equal(Band.Low, Only(Water(First(1))).Band);
    }

    [Fact]
    public void ReportingLimit_NotBelowTheLevel_SaysWeCannotTell()
    {
        // A lab that measures down to 2 µg/L can't show water is under the 1 ppb school level (AAP 2016).
        // It must not read as "not detected": the household is told the test could not tell, in the caution band.
        var coarse = Interpret(Water(NotDetected(BottleType.FirstDraw, reportingLimit: 2)), Levels.Schools);
        Assert.Equal(Band.Advisory, coarse.Band);
        Assert.Contains("result.reporting-limit-at-level", Codes(coarse));
        Assert.Contains("summary.water.cannot-tell", Codes(coarse));
        Assert.DoesNotContain("summary.water.not-detected", Codes(coarse));
        var fine = Interpret(Water(NotDetected(BottleType.FirstDraw, reportingLimit: 0.5)), Levels.Schools);
        Assert.DoesNotContain("result.reporting-limit-at-level", Codes(fine));
    }

    [Fact]
    public void KitBand_FirstAndFifthLiter_TheHigherCounts()
    {
        // LCRI: lead service line sites take the first and fifth liter; the higher one counts (89 FR 86418).
        var outcome = Interpret(Water(First(3), Fifth(12)));
        Assert.Equal(Band.Action, outcome.Band);
        Assert.Equal([Band.Low, Band.Action], outcome.Findings.Select(f => f.Band));
    }

    [Fact]
    public void Retest_FindingsKeepTheirOwnBands()
    {
        var kit = Water(First(12), Flushed(2)) with { Validity = [new(ValidityIssueCode.StandingTimeShort, "stood 4 h")] };
        var outcome = Interpret(kit);
        Assert.Equal(Band.Retest, outcome.Band);
        Assert.Equal([Band.Action, Band.Low], outcome.Findings.Select(f => f.Band));
        Assert.Equal(kit.Validity, outcome.Validity);
    }

    [Fact]
    public void Interpretation_RecordsTheProfileIdAndVersion()
    {
        var outcome = Interpret(Water(First(3)), Levels.HealthCanada);
        Assert.Equal(("health-canada", 1), (outcome.ProfileId, outcome.ProfileVersion));
    }
}
