using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Interpretation.Kit;
using Outcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>
/// Results to check with the lab before any letter. Every limit is a setting of ours (PlausibilityLimits), not a
/// published rule: each test names the default's marker. The action level they lean on is the LCRI's 10 µg/L
/// (89 FR 86418, published).
/// </summary>
public class InterpreterPlausibilityTests
{
    private static ImplausibleResult OnlyImplausible(Outcome outcome)
    {
        Assert.Contains(AttentionFlag.Implausible, outcome.Flags);
        return Assert.Single(outcome.Implausible);
    }

    private static void NoneImplausible(Outcome outcome)
    {
        Assert.Empty(outcome.Implausible);
        Assert.DoesNotContain(AttentionFlag.Implausible, outcome.Flags);
    }

    [Fact]
    public void Plausibility_LeadTwoThousandFirstDraw_ImplausibleBesideUrgentAndStillUrgent()
    {
        // "2.0 ppm" read as mg/L is 2,000 µg/L. 1,000 µg/L: the program's choice (common practice), 100 times the
        // LCRI action level; the result still counts as urgent, since it may be real.
        var outcome = Interpret(Water(First(2000), Flushed(3)));

        var found = OnlyImplausible(outcome);
        Assert.Equal(ImplausibleReason.AboveTapWaterRange, found.Reason);
        Assert.Equal((BottleType.FirstDraw, Analyte.Lead, 2000.0, 1000.0), (found.Bottle, found.Analyte, found.Value, found.Limit));
        Assert.Equal(Band.Urgent, outcome.Band);
        // The attention list sorts on the declared order: urgent, then implausible, then the action level.
        Assert.Equal([AttentionFlag.Urgent, AttentionFlag.Implausible, AttentionFlag.ActionLevel], outcome.Flags);
    }

    [Theory]
    [InlineData(1000, false)]
    [InlineData(1000.01, true)]
    public void Plausibility_LeadAtTheTapWaterLimit_FlaggedOnlyAbove(double lead, bool flagged)
    {
        // 1,000 µg/L default: common practice (our choice); "above" means strictly above.
        var outcome = Interpret(Water(First(lead), Flushed(lead / 20)));
        Assert.Equal(flagged, outcome.Implausible.Count == 1);
    }

    [Fact]
    public void Plausibility_FlushedMoreThanTenTimesFirstDrawAtActionLevel_CheckForSwappedBottles()
    {
        // Factor 10 and "at or above the action level": our choice (common practice).
        var found = OnlyImplausible(Interpret(Water(First(2), Flushed(25))));

        Assert.Equal(ImplausibleReason.FlushedFarAboveFirstDraw, found.Reason);
        Assert.Equal(BottleType.Flushed, found.Bottle);
        Assert.Equal((25.0, 10.0, 2.0, 10.0), (found.Value, found.Limit, found.FirstDraw!.Value, found.Factor!.Value));
        Assert.False(found.FirstDrawBelowReportingLimit);
    }

    [Theory]
    [InlineData(0.8, 9.5)]   // more than ten times, but under the action level (10 µg/L, 89 FR 86418)
    [InlineData(3, 25)]      // above the action level, but not ten times the first draw
    [InlineData(2.5, 25)]    // exactly ten times: not more than
    public void Plausibility_FlushedHigherButNotFarAboveOrLow_NotFlagged(double firstDraw, double flushed) =>
        NoneImplausible(Interpret(Water(First(firstDraw), Flushed(flushed))));

    [Fact]
    public void Plausibility_FirstDrawNotDetected_ComparedAtItsReportingLimit()
    {
        // "< 1 µg/L" is at most 1, so a flushed 12 µg/L is more than ten times it whatever it was.
        var found = OnlyImplausible(Interpret(Water(NotDetected(BottleType.FirstDraw, reportingLimit: 1), Flushed(12))));

        Assert.Equal(ImplausibleReason.FlushedFarAboveFirstDraw, found.Reason);
        Assert.True(found.FirstDrawBelowReportingLimit);
        Assert.Equal(1, found.FirstDraw);
    }

    [Theory]
    [InlineData(20, false)]
    [InlineData(25, true)]
    public void Plausibility_CopperAboveTwentyMgL_Flagged(double copper, bool flagged)
    {
        // 20 mg/L default: our choice (common practice), about 15 times the copper action level (1.3 mg/L, 40 CFR 141.80(c)).
        var outcome = Interpret(Water(First(2), Flushed(1), Copper(copper)));
        if (!flagged)
        {
            NoneImplausible(outcome);
            return;
        }
        var found = OnlyImplausible(outcome);
        Assert.Equal((ImplausibleReason.AboveTapWaterRange, Analyte.Copper, Units.MilligramsPerLiter), (found.Reason, found.Analyte, found.Unit));
        Assert.Equal(20, found.Limit);
    }

    [Theory]
    [InlineData(100_000, false)]
    [InlineData(150_000, true)]
    public void Plausibility_SoilAboveTheInstrumentRange_Flagged(double mgKg, bool flagged)
    {
        // 100,000 mg/kg (10 % lead by weight) default: from memory, beyond portable XRF soil calibrations (SW-846 Method 6200).
        var outcome = Interpret(SoilKit(Home(), Soil(SoilLocation.PlayArea, mgKg), Soil(SoilLocation.Garden, 150)), Levels.SoilHazard);
        if (!flagged)
        {
            NoneImplausible(outcome);
            return;
        }
        var found = OnlyImplausible(outcome);
        Assert.Equal((ImplausibleReason.OutsideInstrumentRange, SoilLocation.PlayArea), (found.Reason, found.Location!.Value));
        Assert.Equal(100_000, found.Limit);
    }

    [Fact]
    public void Plausibility_NegativeSoilReading_Flagged()
    {
        // No concentration is below zero (lab intake refuses such a row too; the rule never trusts one).
        var found = OnlyImplausible(Interpret(SoilKit(Home(), Soil(SoilLocation.Yard, -40)), Levels.SoilHazard));
        Assert.Equal((ImplausibleReason.Negative, -40.0, 0.0), (found.Reason, found.Value, found.Limit));
    }

    [Fact]
    public void Plausibility_NotDetectedWithAHighReportingLimit_NotFlagged()
    {
        // "< RL" says how low a result is, not how high: only detected values meet the upper limits.
        NoneImplausible(Interpret(Water(NotDetected(BottleType.FirstDraw, reportingLimit: 2000), NotDetected(BottleType.Flushed, 2000))));
    }

    [Fact]
    public void Plausibility_Settings_MoveTheLimits()
    {
        var program = new ProgramRules { Plausibility = new PlausibilityLimits { LeadWaterMaxUgL = 500, FlushedOverFirstDrawFactor = 4 } };

        var high = Interpret(Water(First(600), Flushed(30)), program: program);
        var ratio = Interpret(Water(First(3), Flushed(15)), program: program);

        Assert.Equal(ImplausibleReason.AboveTapWaterRange, OnlyImplausible(high).Reason);
        Assert.Equal(ImplausibleReason.FlushedFarAboveFirstDraw, OnlyImplausible(ratio).Reason);
        NoneImplausible(Interpret(Water(First(600), Flushed(30))));
    }

    [Fact]
    public void Plausibility_OrdinaryResults_NoneFlagged()
    {
        NoneImplausible(Interpret(Water(First(12.4), Flushed(3.1))));
        NoneImplausible(Interpret(Water(First(65), Flushed(40), Copper(1.5))));
        NoneImplausible(Interpret(Sequential(Home(), Seq(1, 4), Seq(2, 30), Seq(3, 60))));
    }
}
