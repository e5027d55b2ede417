using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Features.Letters.Composing;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>
/// Letters whose scales are hard to lay out: zero, below the reporting limit, exactly at a level, just either side of
/// one, near and far past the urgent level, levels close together (1 and 10; 10, 15 and 50), and soil near its level.
/// </summary>
internal static class ScaleSweep
{
    static readonly HouseholdContext Home = new(true, false, WaterSource.Public, ServiceLineMaterial.Copper, 1995, false);

    // The 10/15/50 axis: the old 15 µg/L action level, a program advisory at 10 and the program's urgent level 50.
    static readonly ProgramRules CautionAtTen = new(AdvisoryLeadUgL: 10);

    static LetterCase Water(string name, RuleProfile profile, double firstDraw, bool notDetected = false, ProgramRules? program = null) =>
        new(name, new KitFacts(KitKind.Water, LetterCases.Collected, Home,
            [new(BottleType.FirstDraw, null, null, 1000, Analyte.Lead, firstDraw, notDetected, 1),
                new(BottleType.Flushed, null, null, 1000, Analyte.Lead, 3.2, false, 1)], []), profile, Program: program);

    static LetterCase Soil(string name, double dripLine, bool notDetected = false, double playArea = 120) =>
        new(name, new KitFacts(KitKind.Soil, LetterCases.Collected, Home,
            [new(BottleType.Soil, null, SoilLocation.DripLine, null, Analyte.Lead, dripLine, notDetected, 20, notDetected ? null : 40),
                new(BottleType.Soil, null, SoilLocation.PlayArea, null, Analyte.Lead, playArea, false, 20, 10)], []), Profiles.SoilHazard);

    public static readonly LetterCase[] Cases =
    [
        Water("zero", Profiles.UsLcri, 0),
        Water("not detected", Profiles.UsLcri, 1, notDetected: true),
        Water("2.1", Profiles.UsLcri, 2.1),
        Water("just below the action level", Profiles.UsLcri, 9.9),
        Water("at the action level", Profiles.UsLcri, 10),
        Water("just above the action level", Profiles.UsLcri, 10.1),
        Water("near urgent", Profiles.UsLcri, 35),
        Water("at the urgent level", Profiles.UsLcri, 50),
        Water("urgent 75", Profiles.UsLcri, 75),
        Water("2,000 against 10 and 50", Profiles.UsLcri, 2000),
        Water("10 against 10, 15, 50", Profiles.UsLcr, 10, program: CautionAtTen),
        Water("15 against 10, 15, 50", Profiles.UsLcr, 15, program: CautionAtTen),
        Water("50 against 10, 15, 50", Profiles.UsLcr, 50, program: CautionAtTen),
        Water("2,000 against 10, 15, 50", Profiles.UsLcr, 2000, program: CautionAtTen),
        Water("0.5 against 1 and 10", Profiles.Schools, 0.5),
        Water("at 1 against 1 and 10", Profiles.Schools, 1),
        Water("100 against 1 and 10", Profiles.Schools, 100),
        Soil("soil 940 against 1,200", 940),
        Soil("soil at 1,200", 1200),
        Soil("soil not detected", 20, notDetected: true),
        Soil("soil 5,000, play area at 400", 5000, playArea: 400),
        Soil("soil 380 in the play area", 150, playArea: 380),
    ];
}
