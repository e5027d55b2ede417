namespace CommunityLead.Rules.Interpretation;

// One line per result: water (MessageCatalog.Results.cs) and soil (MessageCatalog.Soil.cs).
public static partial class MessageNotes
{
    private const string Censored = "A result below the reporting limit is censored data, reported as not found and never as zero (DOMAIN.md §4, common practice).";

    private const string SoilComparison = "Above or below only beyond ±2σ, else confirm by a lab sample: common practice, no published rule (DOMAIN.md §5). " + ProfileLevels;

    private const string SoilSteps = "Soil steps of DOMAIN.md §5 (common practice; lead-safe contractors: 40 CFR 745 Subpart E).";

    private static Dictionary<string, MessageNote> Results() => new()
    {
        [MessageCatalog.ResultNotDetected.Code] = Practice("Water kit, one line per bottle and metal: the result is below the lab's reporting limit.", Censored),
        [MessageCatalog.ResultMeasured.Code] = Ours("Water kit, one line per bottle and metal: a measured result with no level for that metal in the profile."),
        [MessageCatalog.ResultLow.Code] = Ours("Water kit, one line per bottle and metal: detected, below every level; named against the action level."),
        [MessageCatalog.ResultBelowLevel.Code] = Ours("Water kit, one line per bottle and metal: detected, below the only level the profile has for that metal (not an action level)."),
        [MessageCatalog.ResultAdvisory.Code] = Ours("Water kit, one line per bottle and metal: at or above the caution level, below the action level."),
        [MessageCatalog.ResultAction.Code] = Ours("Water kit, one line per bottle and metal: at or above the action level (lead below the urgent level)."),
        [MessageCatalog.ResultUrgent.Code] = Practice("Water kit, one line per lead bottle: at or above the urgent level; it names both the action level and the urgent level.",
            "The urgent level is the program's choice (Interpretation:UrgentLeadUgL, default 50 µg/L; common practice). " + ProfileLevels),
        [MessageCatalog.ReportingLimitAtLevel.Code] = Practice("Water kit, after a not-detected line: the lab's reporting limit is at or above the lowest level, " +
            "so the result can't be called below it.", Censored),
        [MessageCatalog.CopperTaste.Code] = Published("Water kit, one line per copper bottle: at or above the taste and staining level, below the action level.",
            "Copper secondary standard 1.0 mg/L for taste and blue-green staining (40 CFR 143.3; DOMAIN.md §1)."),
        [MessageCatalog.CopperHealth.Code] = Published("Water kit: a copper result at or above the action level.",
            "EPA drinking-water copper health information; 40 CFR 141 Appendix A to Subpart O (DOMAIN.md §6)."),
    };

    private static Dictionary<string, MessageNote> Soil() => new()
    {
        [MessageCatalog.SoilResultBelowScreening.Code] = Published("Soil kit, one line per sample: below EPA's residential screening level (and so below every hazard standard).",
            "EPA Updated Residential Soil Lead Guidance, 2024-01-17. " + SoilComparison),
        [MessageCatalog.SoilResultAboveScreening.Code] = Published("Soil kit, one line per sample: above EPA's residential screening level, below the hazard standard for its place.",
            "EPA Updated Residential Soil Lead Guidance, 2024-01-17; 40 CFR 745.65. " + SoilComparison),
        [MessageCatalog.SoilDripLinePaint.Code] = Practice("Soil kit: a sample from under the roof edge above a screening or hazard level.",
            "Near a house's drip line, lead in soil mostly comes from old exterior paint (DOMAIN.md §5, common practice); lead paint banned for homes in 1978 (16 CFR 1303, from memory)."),
        [MessageCatalog.StepSoilPaint.Code] = Published("Soil kit, numbered step: any sample above a screening or hazard level, or lead found in a home with a young child or a pregnancy.",
            "Lead-safe certified contractors for paint work: the renovation, repair and painting rule, 40 CFR 745 Subpart E (DOMAIN.md §5)."),
        [MessageCatalog.SoilResultNotDetected.Code] = Practice("Soil kit, one line per sample: below the test's reporting limit, which is under the level.", Censored),
        [MessageCatalog.SoilResultMeasured.Code] = Ours("Soil kit, one line per sample: a measured result with no level for that place in the profile."),
        [MessageCatalog.SoilResultBelow.Code] = Practice("Soil kit, one line per sample: below the level for its place, even with the test's uncertainty.", SoilComparison),
        [MessageCatalog.SoilResultAbove.Code] = Practice("Soil kit, one line per sample: at or above the level for its place, even with the test's uncertainty.", SoilComparison),
        [MessageCatalog.SoilResultInconclusive.Code] = Practice("Soil kit, one line per sample: within ±2 standard deviations of the level for its place.",
            SoilComparison + " Reporting ±2 SD: SW-846 Method 6200, from memory."),
        [MessageCatalog.SoilReportingLimitAtLevel.Code] = Practice("Soil kit, one line per sample: not detected, but the reporting limit is at or above the level.", Censored),
        [MessageCatalog.SoilOtherSource.Code] = Published("Soil kit: the lower screening level was used because the home may have another lead source " +
            "(a lead or galvanized service line, or built before 1978).",
            "200 ppm, 100 ppm with another lead source: EPA Updated Residential Soil Lead Guidance, 2024-01-17 (DOMAIN.md §5); 1978 lead-paint ban, from memory (16 CFR 1303)."),
        [MessageCatalog.StepSoilCover.Code] = Practice("Soil kit, steps: a place at or above its level or too close to call, or lead found in a home with a child under 6 or a pregnancy.", SoilSteps),
        [MessageCatalog.StepSoilPlay.Code] = Practice("Soil kit, steps: as step.soil-cover.", SoilSteps),
        [MessageCatalog.StepSoilClean.Code] = Practice("Soil kit, steps: as step.soil-cover.", SoilSteps),
        [MessageCatalog.StepSoilDust.Code] = Practice("Soil kit, steps: as step.soil-cover.", SoilSteps),
        [MessageCatalog.StepSoilGarden.Code] = Practice("Soil kit, steps: the garden sample is at or above its level or too close to call.", SoilSteps),
        [MessageCatalog.StepRetestSoil.Code] = Ours("Soil kit, steps of a retest letter.", "Our wording."),
    };
}
