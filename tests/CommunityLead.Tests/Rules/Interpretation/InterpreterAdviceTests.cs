using System.Text.RegularExpressions;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Interpretation.Kit;
using Outcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>
/// Advice a health professional would sign, checked over every realistic case at once, so a new case or message
/// can't bring back a contradiction a health educator found (DOMAIN.md §6).
/// </summary>
public partial class InterpreterAdviceTests
{
    private static readonly string[] RunTap = ["step.run-tap", "step.copper-run-tap"];

    private static IEnumerable<(string Name, KitFacts Kit, Outcome Outcome)> Cases() =>
        InterpreterCases.All.Select(c => (c.Key, c.Value.Kit, Interpret(c.Value.Kit, c.Value.Profile, c.Value.Program)));

    private static Band LeadTop(Outcome o) => o.Findings.Where(f => f is { Analyte: Analyte.Lead } && f.Bottle != BottleType.Soil)
        .Select(f => f.Band).DefaultIfEmpty(Band.NotDetected).Max();

    private static HashSet<string> Codes(Outcome o) => [.. o.Messages.Select(m => m.Code)];

    // DOMAIN.md §6 [memory]: carbon filters certified to NSF/ANSI 53 generally do not remove fluoride; reverse osmosis
    // (NSF/ANSI 58) does. Fluoride may be named only beside reverse osmosis.
    [Fact]
    public void Catalog_Fluoride_IsNamedOnlyWhereReverseOsmosisIs()
    {
        Assert.All(MessageCatalog.All.Where(t => t.En.Contains("fluoride", StringComparison.OrdinalIgnoreCase)), t =>
        {
            Assert.Contains("Reverse osmosis", t.En);
            Assert.Contains("NSF/ANSI 58", t.En);
            Assert.Contains("ósmosis inversa", t.Es);
        });
        Assert.DoesNotContain("fluoride", MessageCatalog.StepFilter.En, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("flúor", MessageCatalog.StepFilter.Es, StringComparison.OrdinalIgnoreCase);
    }

    // DOMAIN.md §6 [practice]: where lead comes from the service line, running the tap draws service-line water; flushing
    // is never a substitute for a certified filter or bottled water at or above an action level.
    [Fact]
    public void EveryCase_ServiceLineSourceOrActionLevel_NeverToldToRunTheTap()
    {
        var checkedCases = 0;
        foreach (var (name, kit, outcome) in Cases().Where(c => c.Kit.Kind != KitKind.Soil))
        {
            var lineSource = kit.Household.ServiceLine == ServiceLineMaterial.Lead
                || outcome.Pattern == SourcePattern.ServiceLineOrFurther
                || outcome.Flags.Contains(AttentionFlag.SuspectedServiceLine);
            if (!lineSource && LeadTop(outcome) < Band.Action) continue;
            checkedCases++;
            Assert.True(!Codes(outcome).Overlaps(RunTap), $"{name}: told to run the tap");
            Assert.DoesNotContain(outcome.Messages, m => m.En.Contains("Running the cold tap before use helps"));
        }
        Assert.True(checkedCases >= 15, $"only {checkedCases} cases with a service-line source or lead at the action level");
    }

    // Flushing stays where the lead points to the faucet or premise plumbing, below the action level [practice].
    [Fact]
    public void FaucetPattern_BelowTheActionLevel_KeepsRunningTheTap()
    {
        var outcome = Interpret(Water(First(7), Flushed(1)), program: new ProgramRules(AdvisoryLeadUgL: 5));
        Assert.Equal(SourcePattern.FaucetOrNearbyPlumbing, outcome.Pattern);
        Assert.Contains("step.run-tap", Codes(outcome));
        Assert.Contains("step.filter", Codes(outcome));
    }

    // One plan per band: filtered or bottled water at the action level; bottled water only when urgent (DOMAIN.md §6).
    [Fact]
    public void EveryCase_OnePlanPerLeadBand()
    {
        foreach (var (name, _, outcome) in Cases())
        {
            var codes = Codes(outcome);
            switch (LeadTop(outcome))
            {
                case Band.Urgent:
                    Assert.True(codes.Contains("step.bottled-only"), $"{name}: urgent without bottled water");
                    Assert.True(!codes.Overlaps(["step.filter", "step.use-filtered", "step.cold-water", "step.copper-filter", "care.filter-in-use", .. RunTap]),
                        $"{name}: urgent with a second plan: {string.Join(", ", codes)}");
                    break;
                case Band.Action:
                    Assert.True(codes.IsSupersetOf(["step.use-filtered", "step.filter"]), $"{name}: action level without filtered or bottled water");
                    Assert.DoesNotContain("step.bottled-only", codes);
                    break;
            }
        }
    }

    // The letter never calls a detected lead value "low" as if it were safe: it is below the action level (DOMAIN.md §1:
    // the health goal is zero). "Lower" and "low enough" are comparisons, not verdicts.
    [Fact]
    public void Catalog_NeverCallsAResultLow()
    {
        Assert.All(MessageCatalog.All, t =>
        {
            Assert.False(LowVerdict().IsMatch(t.En), $"{t.Code}: {t.En}");
            Assert.DoesNotContain("lowest level we use", t.En, StringComparison.OrdinalIgnoreCase);
        });
        var low = Interpret(Water(First(3), Flushed(1)));
        Assert.Contains(low.Messages, m => m.Code == "result.low" && m.En.EndsWith("The action level is 10 µg/L. This is below it."));
    }

    // A not-detected letter says the lab did not find lead, and nothing after it says lead was low [wording].
    [Fact]
    public void NotDetected_SaysOnlyThatLeadWasNotFound()
    {
        var outcome = Interpret(Water(NotDetected(BottleType.FirstDraw), NotDetected(BottleType.Flushed)));
        Assert.Equal(Band.NotDetected, outcome.Band);
        Assert.Contains(outcome.Messages, m => m.Code == "summary.water.not-detected");
        Assert.DoesNotContain(outcome.Messages, m => m.En.Contains("Lead was low") || m.En.Contains("Lead was below"));
    }

    // An urgent letter explains both levels, the rule's action level (10 µg/L, 89 FR 86418) and the program's urgent
    // level (50 µg/L, a setting), and why bottled water rather than a filter: NSF/ANSI 53 lead claims are tested at an
    // influent of 150 µg/L [from memory].
    [Fact]
    public void Urgent_NamesTheActionAndUrgentLevels_AndWhyNotAFilter()
    {
        var outcome = Interpret(Water(First(75), Flushed(20)));
        var line = Assert.Single(outcome.Messages, m => m.Code == "result.urgent");
        Assert.Contains("10 µg/L", line.En);
        Assert.Contains("50 µg/L", line.En);
        Assert.Contains("50 µg/L", line.Es);
        var filter = Assert.Single(outcome.Messages, m => m.Code == "care.filter-tested-level");
        Assert.Contains("150 µg/L", filter.En);
        Assert.DoesNotContain(outcome.Messages, m => m.Code == "summary.water.urgent" && m.En.Contains("filter"));
    }

    // Copper gets copper's words: stomach upset, infants, Wilson's disease (EPA copper health information; 40 CFR 141
    // Subpart O Appendix A), and no blood lead test of its own (DOMAIN.md §6).
    [Fact]
    public void CopperAtItsActionLevel_GetsCopperAdviceAndNoLeadUrgency()
    {
        var outcome = Interpret(Water(Home(pregnant: true), First(2.1), Copper(1.31)));
        var health = Assert.Single(outcome.Messages, m => m.Code == "copper.health");
        Assert.Contains("stomach", health.En);
        Assert.Contains("Babies", health.En);
        Assert.Contains("Wilson", health.En);
        Assert.Equal("summary.water.copper-action", outcome.Messages[0].Code);
        Assert.DoesNotContain(outcome.Messages, m => m.Code is "care.blood-test-soon" or "step.filter" or "care.vulnerable-water");
        Assert.Contains(outcome.Messages, m => m.Code == "care.blood-test");
    }

    // A short standing time biases lead low (DOMAIN.md §6 [practice]): a sample to be retaken that already reached a
    // level is shown, said likely as high or higher, and its precautions start now.
    [Fact]
    public void ShortStanding_AlreadyAtTheLevel_ShowsTheResultAndStartsThePrecautions()
    {
        var kit = Water(First(10.7), Flushed(11.8)) with
        {
            Validity = [new ValidityIssue(ValidityIssueCode.StandingTimeShort, "The water stood 3 hours.")],
        };
        var outcome = Interpret(kit);
        Assert.Equal(Band.Retest, outcome.Band);
        var said = string.Join(" ", outcome.Messages.Select(m => m.En));
        Assert.Contains("10.7 µg/L", said);
        Assert.Contains("11.8 µg/L", said);
        Assert.Contains("likely as high or higher", said);
        Assert.True(Codes(outcome).IsSupersetOf(["step.retest-water", "step.use-filtered", "step.filter"]));
    }

    // Soil: 940 mg/kg under the roof edge is above EPA's 2024 residential screening level of 200 mg/kg though below the
    // 1,200 mg/kg yard hazard standard (40 CFR 745.65); old exterior paint is the usual source there (DOMAIN.md §5).
    [Fact]
    public void Soil940AtTheDripLine_IsAboveTheScreeningLevel_WithPaintAndSoilSteps()
    {
        var outcome = Interpret(SoilKit(Home(built: 1995), Soil(SoilLocation.DripLine, 940)), Levels.SoilHazardAndScreening);
        Assert.Equal(Band.Advisory, outcome.Band);
        var line = Assert.Single(outcome.Messages, m => m.Code == "soil.above-screening");
        Assert.Contains("200 mg/kg", line.En);
        Assert.Contains("1,200 mg/kg", line.En);
        Assert.Contains(outcome.Messages, m => m.Code == "soil.drip-line-paint" && m.En.Contains("paint"));
        Assert.True(Codes(outcome).IsSupersetOf(
            ["step.soil-play", "step.soil-cover", "step.soil-clean", "step.soil-garden", "step.soil-paint"]));
    }

    // A soil letter names no water utility, service line or plumber: its professionals are lead-safe certified
    // contractors (40 CFR 745 Subpart E).
    [Fact]
    public void EverySoilCase_NamesNoUtilityServiceLineOrPlumber()
    {
        foreach (var (name, _, outcome) in Cases().Where(c => c.Kit.Kind == KitKind.Soil))
            Assert.All(outcome.Messages, m =>
            {
                foreach (var word in new[] { "utility", "service line", "plumber", "pipe" })
                    Assert.False(m.En.Contains(word, StringComparison.OrdinalIgnoreCase), $"{name}: {m.Code} names {word}: {m.En}");
                foreach (var word in new[] { "compañía de agua", "línea de servicio", "plomero", "tuber" })
                    Assert.False(m.Es.Contains(word, StringComparison.OrdinalIgnoreCase), $"{name}: {m.Code} names {word}: {m.Es}");
            });
    }

    [GeneratedRegex(@"\b(is|are|was|were|results are|result is)\s+low\b", RegexOptions.IgnoreCase)]
    private static partial Regex LowVerdict();
}
