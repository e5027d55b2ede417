namespace CommunityLead.Rules.Interpretation;

// Where the lead seems to come from, and this home's pipes (MessageCatalog.Sources.cs).
public static partial class MessageNotes
{
    private const string Patterns = "Reading the source from first-draw and flushed (or sequential) samples is common practice (DOMAIN.md §3, §6); " +
        "\"as high\" means at least 70 % of the first draw, our choice.";

    private const string Peaks = "Sequential sampling: the bottle where lead peaks points to the plumbing that water stood in (DOMAIN.md §3, common practice); " +
        "about 0.29 L of water per meter of 19 mm pipe.";

    private const string Inventory = "Water systems keep an inventory of service-line materials and replacement programs (40 CFR 141.84, from memory).";

    private static Dictionary<string, MessageNote> Sources() => new()
    {
        [MessageCatalog.StepAskUtility.Code] = Practice("Water kit on public water, steps: lead found that points to the service line, in a home not already listed with a lead or galvanized line.",
            "Running the tap draws service-line water, so the utility is asked about the line instead (DOMAIN.md §6, common practice)."),
        [MessageCatalog.PatternFaucet.Code] = Practice("Water kit with first-draw and flushed bottles: first draw at or above the lowest lead level, " +
            "flushed low and well under it.", Patterns),
        [MessageCatalog.PatternFurther.Code] = Practice("Public-water kit with first-draw and flushed bottles: flushed lead high, or as high as the first draw.", Patterns),
        [MessageCatalog.PatternFurtherWell.Code] = Practice("Private-well kit with first-draw and flushed bottles: flushed lead high, or as high as the first draw.", Patterns),
        [MessageCatalog.PatternNone.Code] = Practice("Water kit with first-draw and flushed bottles: both below the lowest lead level.", Patterns),
        [MessageCatalog.PeakFaucet.Code] = Practice("Sequential kit: lead peaks, at or above the lowest level, in bottle 1.", Peaks),
        [MessageCatalog.PeakHomePipes.Code] = Practice("Sequential kit: lead peaks, at or above the lowest level, after less than 1 liter.", Peaks),
        [MessageCatalog.PeakFurther.Code] = Practice("Public-water sequential kit: lead peaks, at or above the lowest level, after 1 liter or more.", Peaks),
        [MessageCatalog.PeakFurtherWell.Code] = Practice("Private-well sequential kit: lead peaks, at or above the lowest level, after 1 liter or more.", Peaks),
        [MessageCatalog.PeakLow.Code] = Ours("Sequential kit: lead is below the lowest level in every bottle; names the bottle where it was highest."),
        [MessageCatalog.FifthLiterHigher.Code] = Published("Public-water kit with a fifth liter: the fifth liter at or above the caution level and higher than the first.",
            "First and fifth liter at lead service line sites, the higher one counts (LCRI, 89 FR 86418; DOMAIN.md §3)."),
        [MessageCatalog.FifthLiterHigherWell.Code] = Published("Private-well kit with a fifth liter: the fifth liter at or above the caution level and higher than the first.",
            "First and fifth liter (LCRI, 89 FR 86418; DOMAIN.md §3)."),
        [MessageCatalog.ServiceLineLead.Code] = Memory("Water kit, public water: the household's record says lead service line.", Inventory),
        [MessageCatalog.ServiceLineGalvanized.Code] = Memory("Water kit, public water: the household's record says galvanized service line.",
            "Galvanized lines once downstream of lead pipe can hold lead and are to be replaced; " + Inventory),
        [MessageCatalog.WellPipe.Code] = Ours("Water kit, private well: the household's record says lead or galvanized pipe.",
            "Our wording; defers to a licensed plumber."),
        [MessageCatalog.WellAdvice.Code] = Practice("Every private-well water kit.",
            "Private wells are not tested by a water system; the owner tests and the local health department advises (common practice)."),
    };
}
