using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Rules.Interpretation.AttentionFlag;
using static CommunityLead.Rules.Interpretation.SourcePattern;
using static CommunityLead.Rules.Sampling.SoilLocation;
using static CommunityLead.Tests.Rules.Interpretation.Kit;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>
/// Realistic kits, by name. Profile: US LCRI (lead 10 µg/L, 89 FR 86418; copper 1.3 and 1.0 mg/L, 40 CFR 141.80(c)
/// and 143.3) unless a case names another; program defaults (no advisory, urgent 50 µg/L, 19 mm pipe).
/// </summary>
internal static class InterpreterCases
{
    private static readonly ProgramRules Advisory5 = new(AdvisoryLeadUgL: 5);
    private static ValidityIssue Issue(ValidityIssueCode code) => new(code, "reason from the lab or the collection check");
    private static KitFacts On(this KitFacts kit, string day) => kit with { CollectedOn = DateOnly.Parse(day) };
    private static KitFacts With(this KitFacts kit, params ValidityIssueCode[] issues) => kit with { Validity = [.. issues.Select(Issue)] };

    public static readonly IReadOnlyDictionary<string, InterpreterCase> All = new Dictionary<string, InterpreterCase>
    {
        // First draw against flushed water.
        ["both not detected"] = new(Water(NotDetected(BottleType.FirstDraw), NotDetected(BottleType.Flushed)), Band.NotDetected, NoSourceAtThisTap, [],
            ["summary.water.not-detected", "result.not-detected", "pattern.none", "care.blood-test"], ["step.filter"]),
        ["both low"] = new(Water(First(3), Flushed(1)), Band.Low, NoSourceAtThisTap, [], ["summary.water.low", "result.low", "pattern.none"]),
        ["faucet at action level"] = new(Water(First(14), Flushed(2)), Band.Action, FaucetOrNearbyPlumbing, [ActionLevel],
            ["summary.water.action", "result.action", "pattern.faucet", "step.use-filtered", "step.filter"]),
        ["faucet urgent"] = new(Water(First(60), Flushed(3)), Band.Urgent, FaucetOrNearbyPlumbing, [Urgent, ActionLevel],
            ["summary.water.urgent", "result.urgent", "pattern.faucet", "step.filter"], ["step.use-filtered", "step.cold-water", "step.run-tap"]),
        ["flushed higher"] = new(Water(First(12), Flushed(15)), Band.Action, ServiceLineOrFurther, [ActionLevel, SuspectedServiceLine],
            ["pattern.further", "step.filter"]),
        ["flushed 75 % of first draw"] = new(Water(First(12), Flushed(9)), Band.Action, ServiceLineOrFurther, [ActionLevel, SuspectedServiceLine],
            ["pattern.further"]),
        ["flushed 67 % of first draw"] = new(Water(First(12), Flushed(8)), Band.Action, FaucetOrNearbyPlumbing, [ActionLevel], ["pattern.faucet"]),
        ["big drop but still high"] = new(Water(First(100), Flushed(30)), Band.Urgent, ServiceLineOrFurther, [Urgent, ActionLevel, SuspectedServiceLine],
            ["pattern.further"], ["pattern.faucet"]),
        ["first low flushed high"] = new(Water(First(4), Flushed(11)), Band.Action, ServiceLineOrFurther, [ActionLevel, SuspectedServiceLine],
            ["pattern.further"]),
        ["program advisory faucet"] = new(Water(First(7), Flushed(1)), Band.Advisory, FaucetOrNearbyPlumbing, [],
            ["summary.water.advisory", "result.advisory", "pattern.faucet", "step.filter"], ["step.use-filtered"], Program: Advisory5),
        ["program advisory flushed same"] = new(Water(First(6), Flushed(6)), Band.Advisory, ServiceLineOrFurther, [SuspectedServiceLine],
            ["pattern.further"], Program: Advisory5),
        ["program advisory both under it"] = new(Water(First(4), Flushed(4.5)), Band.Low, NoSourceAtThisTap, [], ["pattern.none"], Program: Advisory5),
        ["Health Canada 5 at the level"] = new(Water(First(5), Flushed(1)), Band.Action, FaucetOrNearbyPlumbing, [ActionLevel],
            ["result.action"], Profile: Levels.HealthCanada),
        ["EU day before 5 µg/L"] = new(Water(First(7), Flushed(1)).On("2036-01-11"), Band.Low, NoSourceAtThisTap, [], ["result.low"], Profile: Levels.Eu),
        ["EU first day of 5 µg/L"] = new(Water(First(7), Flushed(1)).On("2036-01-12"), Band.Action, FaucetOrNearbyPlumbing, [ActionLevel],
            ["result.action", "pattern.faucet"], Profile: Levels.Eu),
        ["US 15 before the LCRI date"] = new(Water(First(12)).On("2027-10-31"), Band.Low, null, [], ["result.low"], Profile: Levels.UsLcrThenLcri),
        ["US 10 from the LCRI date"] = new(Water(First(12)).On("2027-11-01"), Band.Action, null, [ActionLevel], ["result.action"], Profile: Levels.UsLcrThenLcri),
        ["school fountain over 1 ppb"] = new(Water(First(2), NotDetected(BottleType.Flushed, reportingLimit: 0.5)), Band.Advisory, FaucetOrNearbyPlumbing, [], ["result.advisory"], Profile: Levels.Schools),

        // First and fifth liter (LCRI, lead service line homes).
        ["fifth liter higher"] = new(Water(Home(line: ServiceLineMaterial.Lead), First(6), Fifth(14)), Band.Action, null, [ActionLevel, SuspectedServiceLine],
            ["fifth-liter.higher", "service-line.lead", "result.low", "result.action"]),
        ["first liter higher"] = new(Water(Home(line: ServiceLineMaterial.Lead), First(14), Fifth(8)), Band.Action, null, [ActionLevel],
            ["service-line.lead"], ["fifth-liter.higher"]),
        ["first and fifth low"] = new(Water(Home(line: ServiceLineMaterial.Lead), First(2), Fifth(3)), Band.Low, null, [],
            ["service-line.lead"], ["fifth-liter.higher"]),

        // Copper.
        ["copper taste"] = new(Water(NotDetected(BottleType.FirstDraw), Copper(1.0)), Band.Advisory, null, [], ["copper.taste"], ["copper.health"]),
        ["copper action"] = new(Water(First(2), Copper(1.3)), Band.Action, null, [ActionLevel], ["copper.health", "result.action"], ["step.use-filtered"]),
        ["copper, profile without copper levels"] = new(Water(First(2), Copper(1.6)), Band.Low, null, [], ["result.measured"],
            Profile: Levels.HealthCanada),
        ["school, lab can't see 1 ppb"] = new(Water(NotDetected(BottleType.FirstDraw, reportingLimit: 2)), Band.Advisory, null, [],
            ["result.not-detected", "result.reporting-limit-at-level", "summary.water.cannot-tell"], Profile: Levels.Schools),
        ["copper low"] = new(Water(First(2), Copper(0.4)), Band.Low, null, [], ["result.low"], ["copper.taste", "copper.health"]),
        ["copper action, child"] = new(Water(Home(child: true), NotDetected(BottleType.FirstDraw), Copper(1.5)), Band.Action, null,
            [ActionLevelVulnerableHome], ["copper.health", "care.blood-test"], ["care.vulnerable-water"]),

        // The household.
        ["child, low lead"] = new(Water(Home(child: true), First(2), Flushed(1)), Band.Low, NoSourceAtThisTap, [],
            ["care.vulnerable-water", "care.blood-test-soon", "step.filter"], ["care.blood-test"]),
        ["pregnant, action"] = new(Water(Home(pregnant: true), First(11), Flushed(3)), Band.Action, FaucetOrNearbyPlumbing, [ActionLevelVulnerableHome],
            ["care.vulnerable-water", "care.blood-test-soon"]),
        ["child, urgent"] = new(Water(Home(child: true), First(80), Flushed(60)), Band.Urgent, ServiceLineOrFurther,
            [Urgent, ActionLevelVulnerableHome, SuspectedServiceLine], ["summary.water.urgent", "care.vulnerable-water"]),
        ["child, not detected"] = new(Water(Home(child: true), NotDetected(BottleType.FirstDraw)), Band.NotDetected, null, [],
            ["care.blood-test"], ["care.vulnerable-water", "care.blood-test-soon"]),
        ["private well, flushed high"] = new(Water(Home(well: true), First(3), Flushed(12)), Band.Action, ServiceLineOrFurther,
            [ActionLevel, SuspectedServiceLine], ["pattern.further-well", "well.advice", "closing.well"], ["pattern.further", "closing.public"]),
        ["private well, low"] = new(Water(Home(well: true), First(2)), Band.Low, null, [], ["well.advice", "closing.well"]),
        ["galvanized line, low"] = new(Water(Home(line: ServiceLineMaterial.Galvanized), First(3), Flushed(3)), Band.Low, NoSourceAtThisTap, [],
            ["service-line.galvanized"]),
        ["private well, lead pipe"] = new(Water(Home(well: true, line: ServiceLineMaterial.Lead), First(4)), Band.Low, null, [],
            ["service-line.well-pipe"], ["service-line.lead"]),
        ["private well, fifth liter higher"] = new(Water(Home(well: true), First(4), Fifth(16)), Band.Action, null, [ActionLevel, SuspectedServiceLine],
            ["fifth-liter.higher-well"], ["fifth-liter.higher"]),
        ["filter in use"] = new(Water(Home(filter: true), First(3)), Band.Low, null, [], ["care.filter-in-use"]),

        // Validity.
        ["standing time short"] = new(Water(First(8), Flushed(2)).With(ValidityIssueCode.StandingTimeShort), Band.Retest, NoSourceAtThisTap,
            [RetestNeeded], ["summary.retest", "retest.standing-time-short", "step.retest-water"], ["result.low", "pattern.none"]),
        ["QC held, very high"] = new(Water(First(70)).With(ValidityIssueCode.QcHeld), Band.Retest, null, [Urgent, ActionLevel, RetestNeeded],
            ["retest.qc-held", "step.filter"], ["result.urgent", "step.use-filtered"]),
        ["outside holding time"] = new(Water(First(3)).With(ValidityIssueCode.OutsideHoldingTime), Band.Retest, null, [RetestNeeded],
            ["retest.outside-holding-time"]),
        ["collection invalid"] = new(Water(First(3)).With(ValidityIssueCode.CollectionInvalid), Band.Retest, null, [RetestNeeded],
            ["retest.collection-invalid"]),
        ["no results"] = new(Water(), Band.Retest, null, [RetestNeeded], ["retest.collection-invalid"]),
        ["corrected after letter"] = new(Water(First(12)) with { CorrectedAfterLetter = true }, Band.Action, null, [ActionLevel, CorrectedAfterLetter],
            ["letter.corrected"]),

        // Sequential profiles (19 mm pipe holds about 0.2835 L per meter, DOMAIN.md §3).
        ["peak in bottle 1"] = new(Sequential(Home(), Seq(1, 20, 250), Seq(2, 6, 250), Seq(3, 3, 250), Seq(4, 2, 250)), Band.Action, null,
            [ActionLevel], ["peak.faucet"], Peak: (1, 0)),
        ["peak in home pipes"] = new(Sequential(Home(), Seq(1, 3, 250), Seq(2, 5, 250), Seq(3, 12, 250), Seq(4, 4, 250)), Band.Action, null,
            [ActionLevel], ["peak.home-pipes"], Peak: (3, 0.5 / 0.28353)),
        ["peak at the service line"] = new(Sequential(Home(line: ServiceLineMaterial.Lead),
                Seq(1, 4), Seq(2, 5), Seq(3, 5), Seq(4, 6), Seq(5, 18), Seq(6, 22), Seq(7, 9), Seq(8, 5)),
            Band.Action, null, [ActionLevel, SuspectedServiceLine], ["peak.further", "service-line.lead"], Peak: (6, 5 / 0.28353)),
        ["peak, volumes unknown"] = new(Sequential(Home(), Seq(1, 2, null), Seq(2, 4, null), Seq(3, 8, null)), Band.Low, null, [],
            ["peak.low"], Peak: (3, 2 / 0.28353)),
        ["peak, volumes unknown, advisory"] = new(Sequential(Home(), Seq(1, 2, null), Seq(2, 4, null), Seq(3, 8, null)), Band.Advisory, null,
            [SuspectedServiceLine], ["peak.further"], Program: Advisory5, Peak: (3, 2 / 0.28353)),
        ["peak, all low"] = new(Sequential(Home(), Seq(1, 1), Seq(2, 2), Seq(3, 1)), Band.Low, null, [], ["peak.low"], Peak: (2, 1 / 0.28353)),
        ["peak, private well"] = new(Sequential(Home(well: true), Seq(1, 3), Seq(2, 4), Seq(3, 6), Seq(4, 15)), Band.Action, null,
            [ActionLevel, SuspectedServiceLine], ["peak.further-well", "closing.well"], ["peak.further"], Peak: (4, 3 / 0.28353)),
        ["sequential, nothing found"] = new(Sequential(Home(), NotDetected(BottleType.Sequential, position: 1),
            NotDetected(BottleType.Sequential, position: 2)), Band.NotDetected, null, [], ["result.not-detected"], ["peak.low"]),
        ["peak, 25 mm pipe"] = new(Sequential(Home(), Seq(1, 3), Seq(2, 9), Seq(3, 16)), Band.Action, null, [ActionLevel, SuspectedServiceLine],
            ["peak.further"], Program: new ProgramRules(PipeInnerDiameterMm: 25), Peak: (3, 2 / 1000.0 / (Math.PI * 0.0125 * 0.0125))),

        // Soil: 400 play area / 1,200 elsewhere (40 CFR 745.65); 200 / 100 screening (EPA 2024).
        ["play area above"] = new(SoilKit(Home(), Soil(PlayArea, 450)), Band.Action, null, [ActionLevel],
            ["summary.soil.above", "soil.above", "step.soil-play", "step.soil-cover"], Profile: Levels.SoilHazard),
        ["play area too close to call"] = new(SoilKit(Home(), Soil(PlayArea, 420, 15)), Band.Advisory, null, [],
            ["summary.soil.inconclusive", "soil.inconclusive", "step.soil-play"], Profile: Levels.SoilHazard),
        ["play area above beyond 2σ"] = new(SoilKit(Home(), Soil(PlayArea, 440, 15)), Band.Action, null, [ActionLevel], ["soil.above"],
            Profile: Levels.SoilHazard),
        ["yard below 1,200"] = new(SoilKit(Home(), Soil(Yard, 900, 40), Soil(PlayArea, 120, 10)), Band.Low, null, [],
            ["summary.soil.low", "soil.below"], ["step.soil-play"], Profile: Levels.SoilHazard),
        ["garden too close to call"] = new(SoilKit(Home(), Soil(Garden, 1150, 50)), Band.Advisory, null, [], ["soil.inconclusive", "step.soil-garden"],
            Profile: Levels.SoilHazard),
        ["old house, screening 100"] = new(SoilKit(Home(built: 1970), Soil(Yard, 150, 10)), Band.Action, null, [ActionLevel],
            ["soil.above", "soil.other-source"], Profile: Levels.SoilScreening),
        ["newer house, screening 200"] = new(SoilKit(Home(built: 1995), Soil(Yard, 150, 10)), Band.Low, null, [], ["soil.below"],
            ["soil.other-source"], Profile: Levels.SoilScreening),
        ["lead line, screening 100"] = new(SoilKit(Home(line: ServiceLineMaterial.Lead), Soil(Yard, 150, 10)), Band.Action, null, [ActionLevel],
            ["soil.other-source"], Profile: Levels.SoilScreening),
        ["child, soil low"] = new(SoilKit(Home(child: true), Soil(Yard, 60)), Band.Low, null, [],
            ["care.vulnerable-soil", "step.soil-play", "care.blood-test-soon"], Profile: Levels.SoilHazard),
        ["soil, profile without soil levels"] = new(SoilKit(Home(), Soil(PlayArea, 450)), Band.Low, null, [], ["soil.measured"]),
        ["soil not detected"] = new(SoilKit(Home(), SoilNotDetected(PlayArea)), Band.NotDetected, null, [],
            ["summary.soil.not-detected", "soil.not-detected"], Profile: Levels.SoilHazard),
        ["soil, private well home"] = new(SoilKit(Home(well: true), Soil(DripLine, 1500)), Band.Action, null, [ActionLevel], ["closing.well"],
            Profile: Levels.SoilHazard),
        ["soil, QC held"] = new(SoilKit(Home(), Soil(PlayArea, 300)).With(ValidityIssueCode.QcHeld), Band.Retest, null, [RetestNeeded],
            ["step.retest-soil", "retest.qc-held"], ["soil.below"], Profile: Levels.SoilHazard),
        ["soil, place not recorded"] = new(SoilKit(Home(), Soil(null, 420)), Band.Action, null, [ActionLevel], ["soil.above"], Profile: Levels.SoilHazard),
        ["soil, limit above screening"] = new(SoilKit(Home(built: 1950), SoilNotDetected(Yard, reportingLimit: 120)), Band.Advisory, null, [],
            ["soil.reporting-limit-at-level"], Profile: Levels.SoilScreening),
    };

    public static TheoryData<string> Names => [.. All.Keys];
}
