namespace CommunityLead.Rules.Interpretation;

// Steps, cautions and retest reasons (MessageCatalog.Care.cs).
public static partial class MessageNotes
{
    private const string ConsumerSteps = "EPA and state consumer guidance (DOMAIN.md §6).";

    private static Dictionary<string, MessageNote> Care() => new()
    {
        [MessageCatalog.StepUseFiltered.Code] = Published("Water kit, steps: the highest lead result is at the action level (not urgent), retest letters included.", ConsumerSteps),
        [MessageCatalog.StepFilter.Code] = Published("Water kit, steps: lead at the caution or action level, or lead found where it points to the service line, " +
            "or a known lead service line. No word on fluoride (carbon filters for lead generally keep it; DOMAIN.md §6, from memory).",
            "NSF/ANSI 53 for lead and 42 for particles: " + ConsumerSteps),
        [MessageCatalog.StepBottledOnly.Code] = Published("Water kit, steps: a lead result at or above the urgent level; the one plan until a retest.",
            "Bottled water for drinking, cooking and formula: " + ConsumerSteps),
        [MessageCatalog.FilterTestedLevel.Code] = Memory("Water kit, cautions: a lead result at or above the urgent level; says why bottled water and not a filter.",
            "NSF/ANSI 53 lead reduction claims are tested on water with 150 µg/L of lead (from memory: check the standard's current challenge level)."),
        [MessageCatalog.StepCopperRunTap.Code] = Published("Water kit, steps: copper at or above its action level, where running the tap is allowed (lead below the action level " +
            "and not pointing to the service line).", "EPA copper guidance: run the cold tap after water stood in copper pipes (DOMAIN.md §6)."),
        [MessageCatalog.StepCopperFormula.Code] = Published("Water kit, steps: copper at or above its action level.",
            "Infants are most sensitive to copper: EPA drinking-water copper health information (DOMAIN.md §6)."),
        [MessageCatalog.StepCopperFilter.Code] = Memory("Water kit, steps: copper at or above its action level, lead below urgent. The only step naming fluoride, beside reverse osmosis.",
            "Reverse osmosis (NSF/ANSI 58) reduces copper and removes fluoride (DOMAIN.md §6, from memory)."),
        [MessageCatalog.VulnerableUrgent.Code] = Published("Water kit, cautions: an urgent lead result in a home with a child under 6 or a pregnancy.",
            "Young children and pregnancies are most at risk from lead (DOMAIN.md §6); bottled water: " + ConsumerSteps),
        [MessageCatalog.StepColdWater.Code] = Published("Water kit, steps: every band except urgent (an urgent home is told to use bottled water only).", ConsumerSteps),
        [MessageCatalog.StepRunTap.Code] = Published("Water kit, steps: lead below the action level, and only where the lead does not point to the service line " +
            "(no known lead service line, no service-line pattern or peak).",
            "Run the cold tap 30 s to 2 min after water stood: " + ConsumerSteps + " Flushing only for faucet and premise patterns (DOMAIN.md §6, common practice)."),
        [MessageCatalog.StepAerator.Code] = Published("Water kit, steps: every water letter.", "Clean faucet aerators: " + ConsumerSteps),
        [MessageCatalog.StepRetestWater.Code] = Published("Water kit, steps of a retest letter.",
            "First draw after the water stood unused at least 6 hours: EPA homeowner tap-sample instructions, 2024 (DOMAIN.md §3)."),
        [MessageCatalog.NoSafeLevel.Code] = Published("Every kit, cautions.",
            "No level of lead in drinking water is known to be safe for children; the health goal is zero (40 CFR 141.51; DOMAIN.md §1)."),
        [MessageCatalog.NoBoil.Code] = Published("Water kit, cautions: every water letter.", "Boiling does not remove lead, it concentrates it: " + ConsumerSteps),
        [MessageCatalog.BloodTest.Code] = Practice("Every kit, cautions, unless care.blood-test-soon is sent instead.",
            "Homes with a child under 6 or a pregnancy are told to ask a doctor about a blood lead test (DOMAIN.md §6; program rule)."),
        [MessageCatalog.BloodTestSoon.Code] = Practice("Any kit, cautions: lead was detected in a home with a child under 6 or a pregnancy.",
            "As care.blood-test, sooner where lead was found (DOMAIN.md §6; program rule)."),
        [MessageCatalog.VulnerableWater.Code] = Published("Water kit, cautions: lead was detected in a home with a child under 6 or a pregnancy.",
            "Young children and pregnancies are most at risk; cold filtered or bottled water: " + ConsumerSteps),
        [MessageCatalog.VulnerableSoil.Code] = Practice("Soil kit, cautions: lead was detected in a home with a child under 6 or a pregnancy.",
            "Young children take in soil lead from hands and play (DOMAIN.md §5, common practice)."),
        [MessageCatalog.FilterInUse.Code] = Published("Water kit, this home: the household told us it uses a filter.",
            "NSF/ANSI 53 for lead; change cartridges as the maker says: " + ConsumerSteps),
        [MessageCatalog.RetestStandingShort.Code] = Published("Water kit to test again: the first draw stood less than 6 hours (Sampling:MinimumStanding).",
            "At least 6 hours: EPA homeowner tap-sample instructions, 2024 (DOMAIN.md §3)."),
        [MessageCatalog.RetestCollection.Code] = Ours("Any kit to test again: the collection record had a problem, or the kit has no results to interpret.",
            "Our wording; the coordinator sees the exact reason."),
        [MessageCatalog.RetestHoldingTime.Code] = Published("Any kit to test again: analyzed more than 6 months after collection, or acidified more than 14 days after it.",
            "Holding time 6 months (40 CFR 141.23(k)(2)); acid within 14 days (40 CFR 141.86(b)(2)); DOMAIN.md §3."),
        [MessageCatalog.RetestQcHeld.Code] = Ours("Any kit to test again: its results are in a batch held because a quality-control figure was outside its window.",
            "Our wording; the QC windows are settings (EPA Methods 200.7/200.8, some from memory; DOMAIN.md §4)."),
    };
}
