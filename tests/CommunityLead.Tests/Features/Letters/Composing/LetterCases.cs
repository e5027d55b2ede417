using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>One letter to compose: the kit's facts and how the letter is addressed.</summary>
internal sealed record LetterCase(string Name, KitFacts Kit, RuleProfile Profile, LetterLanguage Language = LetterLanguage.En,
    LetterKind? Kind = null, LetterRecipient? To = null, string KitCode = LetterCases.Code, LetterSettings? Sender = null,
    ProgramRules? Program = null)
{
    private ProgramRules Rules => Program ?? LetterCases.DefaultProgram;

    public KitOutcome Interpretation => Interpreter.Interpret(Kit, Profile, Rules);

    public LetterContent Compose() => Compose(Language);

    public LetterContent Compose(LetterLanguage language)
    {
        var outcome = Interpretation;
        var kind = Kind ?? (outcome.Band == Band.Retest ? LetterKind.Retest : LetterKind.Results);
        return LetterComposer.Compose(outcome, Profile.Name, To ?? LetterCases.Ana, language, kind, KitCode, Kit.CollectedOn,
            LetterCases.LetterDate, Kit.Household.WaterSource == WaterSource.PrivateWell, Kit.Household.ChildUnder6 || Kit.Household.Pregnant,
            Sender ?? LetterCases.Settings, LetterLevels.For(Profile, Rules, Kit.CollectedOn));
    }
}

/// <summary>The letters of the brief, each from a real interpretation (lead µg/L, copper mg/L, soil mg/kg).</summary>
internal static class LetterCases
{
    public const string Code = "7KQ4-M2XD-H";
    public static readonly DateOnly Collected = new(2026, 4, 2);
    public static readonly DateOnly LetterDate = new(2026, 4, 3);
    public static readonly ProgramRules DefaultProgram = new();

    public static readonly LetterSettings Settings = new("Brindle Cove Tap Check",
        ["Brindle Cove Health Collaborative", "12 Lantern Street", "Brindle Cove, Tallow County 00001"],
        "+1 555 0100", "tapcheck@example.org", "tapcheck.example.org",
        "Tallow County Health Department", "+1 555 0140", "Brindle Cove Water Works", "+1 555 0150",
        StaffName: "Dana Whitfield", StaffTitle: "Program Coordinator", StaffTitleEs: "Coordinación del programa");

    /// <summary>Long official names and full US phone numbers: the hardest contact lines to keep readable.</summary>
    public static readonly LetterSettings LongNames = Settings with
    {
        ProgramPhone = "(217) 555-0100",
        HealthDepartmentName = "Tallow County Department of Public Health", HealthDepartmentPhone = "(217) 555-0140",
        WaterUtilityName = "City of Brindle Cove Department of Water Management", WaterUtilityPhone = "(217) 555-0150",
        ProgramEmail = "tapcheck-questions@brindlecove-health.example.org",
        StaffName = "Dana Whitfield-Okonkwo", StaffTitle = "Community Lead Testing Program Coordinator", StaffTitleEs = null,
    };

    public static readonly LetterRecipient Ana = new("Ana Quill", "41 Heron Lane", "Apt 2", "Brindle Cove", "TC", "00002");
    public static readonly LetterRecipient Bo = new("Bo Marsh", "9 Kestrel Road", null, "Brindle Cove", "TC", "00003");

    private static HouseholdContext Home(bool child = false, bool well = false, ServiceLineMaterial line = ServiceLineMaterial.Copper) =>
        new(child, false, well ? WaterSource.PrivateWell : WaterSource.Public, line, 1995, false);

    private static BottleResult Lead(BottleType bottle, double value, int? position = null) =>
        new(bottle, position, null, 1000, Analyte.Lead, value, false, 1);

    private static BottleResult LeadNotDetected(BottleType bottle) => new(bottle, null, null, 1000, Analyte.Lead, 1, true, 1);

    private static BottleResult Copper(double mgL) => new(BottleType.FirstDraw, null, null, 1000, Analyte.Copper, mgL, false, 0.02);

    private static BottleResult Soil(SoilLocation location, double mgKg, double sigma) =>
        new(BottleType.Soil, null, location, null, Analyte.Lead, mgKg, false, 20, sigma);

    private static KitFacts Water(HouseholdContext home, BottleResult[] results, ValidityIssue[]? validity = null, bool corrected = false) =>
        new(KitKind.Water, Collected, home, results, validity ?? [], corrected);

    public static readonly LetterCase Low = new("low", Water(Home(),
        [Lead(BottleType.FirstDraw, 2.1), LeadNotDetected(BottleType.Flushed), Copper(0.12)]), Profiles.UsLcri);

    public static readonly LetterCase ActionWithChild = new("action level, child under 6", Water(Home(child: true),
        [Lead(BottleType.FirstDraw, 12.4), Lead(BottleType.Flushed, 3.2)]), Profiles.UsLcri);

    public static readonly LetterCase ServiceLine = new("service-line pattern", Water(Home(line: ServiceLineMaterial.Lead),
        [Lead(BottleType.FirstDraw, 8.6), Lead(BottleType.Flushed, 11.2)]), Profiles.UsLcri);

    public static readonly LetterCase Retest = new("retest, short standing", Water(Home(),
        [Lead(BottleType.FirstDraw, 4.0), Lead(BottleType.Flushed, 1.5)],
        [new ValidityIssue(ValidityIssueCode.StandingTimeShort, "Water stood 2 h 10 min; at least 6 h is needed.")]), Profiles.UsLcri);

    public static readonly LetterCase Corrected = new("corrected", Water(Home(),
        [Lead(BottleType.FirstDraw, 3.3), LeadNotDetected(BottleType.Flushed)], corrected: true), Profiles.UsLcri, Kind: LetterKind.Corrected);

    public static readonly LetterCase Spanish = ActionWithChild with { Name = "Spanish household", Language = LetterLanguage.Es };

    // Play area 380 ± 2 × 30: 320 to 440 spans the 400 level, so not sure; garden 150 ± 20 is below 1,200; the drip
    // line had no lead the XRF could find (< 20).
    public static readonly LetterCase SoilUncertain = new("soil with uncertainty", new KitFacts(KitKind.Soil, Collected, Home(child: true),
        [Soil(SoilLocation.PlayArea, 380, 30), Soil(SoilLocation.Garden, 150, 10),
            new(BottleType.Soil, null, SoilLocation.DripLine, null, Analyte.Lead, 20, true, 20)], []), Profiles.SoilHazard);

    public static readonly LetterCase PrivateWell = new("private well", Water(Home(well: true),
        [Lead(BottleType.FirstDraw, 6.0), LeadNotDetected(BottleType.Flushed)]), Profiles.UsLcri);

    public static readonly LetterCase Sequential = new("sequential", new KitFacts(KitKind.WaterSequential, Collected, Home(),
        [Lead(BottleType.Sequential, 2.0, 1), Lead(BottleType.Sequential, 4.0, 2), Lead(BottleType.Sequential, 40.0, 3)], []), Profiles.UsLcri);

    // The letters a health educator read and found wrong, now each a case (see InterpreterAdviceTests for the rules).
    public static readonly LetterCase NotDetected = new("not detected", Water(Home(),
        [LeadNotDetected(BottleType.FirstDraw), LeadNotDetected(BottleType.Flushed)]), Profiles.UsLcri);

    public static readonly LetterCase ActionFaucet = new("action level, faucet", Water(Home(),
        [Lead(BottleType.FirstDraw, 40), Lead(BottleType.Flushed, 6.2)]), Profiles.UsLcri);

    public static readonly LetterCase Urgent = new("urgent", Water(Home(child: true),
        [Lead(BottleType.FirstDraw, 75), Lead(BottleType.Flushed, 20)]), Profiles.UsLcri);

    public static readonly LetterCase CopperOnly = new("copper only", Water(Home(),
        [Lead(BottleType.FirstDraw, 2.1), Copper(1.31)]), Profiles.UsLcri);

    public static readonly LetterCase RetestHigh = new("retest, already at the level", Water(Home(),
        [Lead(BottleType.FirstDraw, 10.7), Lead(BottleType.Flushed, 11.8)],
        [new ValidityIssue(ValidityIssueCode.StandingTimeShort, "Water stood 3 h; at least 6 h is needed.")]), Profiles.UsLcri);

    public static readonly LetterCase SoilDripLine = new("soil, drip line 940", new KitFacts(KitKind.Soil, Collected, Home(),
        [Soil(SoilLocation.DripLine, 940, 0), Soil(SoilLocation.PlayArea, 150, 10)], []), Profiles.SoilHazardAndScreening);

    // The scale cases: a result far past every level, a soil result just under the hazard standard, and a
    // sequential profile of five bottles.
    public static readonly LetterCase VeryHigh = new("very high", Water(Home(child: true),
        [Lead(BottleType.FirstDraw, 2000), Lead(BottleType.Flushed, 9)]), Profiles.UsLcri);

    public static readonly LetterCase SoilNearLevel = new("soil near its level", new KitFacts(KitKind.Soil, Collected, Home(child: true),
        [Soil(SoilLocation.DripLine, 940, 40), Soil(SoilLocation.PlayArea, 120, 10)], []), Profiles.SoilHazard);

    public static readonly LetterCase SequentialFive = new("sequential, five bottles", new KitFacts(KitKind.WaterSequential, Collected, Home(),
        [Lead(BottleType.Sequential, 3.0, 1), Lead(BottleType.Sequential, 4.5, 2), Lead(BottleType.Sequential, 16.0, 3),
            Lead(BottleType.Sequential, 7.5, 4), Lead(BottleType.Sequential, 2.2, 5)], []), Profiles.UsLcri);

    public static readonly LetterCase[] English = [Low, ActionWithChild, ServiceLine, Retest, Corrected, SoilUncertain, PrivateWell, Sequential,
        NotDetected, ActionFaucet, Urgent, CopperOnly, RetestHigh, SoilDripLine, VeryHigh, SoilNearLevel, SequentialFive];
}
