namespace CommunityLead.Rules.Interpretation;

/// <summary>How sure we are of what a sentence says (the markers of DOMAIN.md, plus our own wording).</summary>
public enum WordingMarker
{
    /// <summary>Seen in the named published source.</summary>
    Published,
    /// <summary>Common practice of the trade; no single source.</summary>
    Practice,
    /// <summary>Recalled, not yet checked against the source text.</summary>
    Memory,
    /// <summary>Our own words for what the service decided; no outside fact beyond the levels it names.</summary>
    OurWording,
}

/// <param name="UsedWhen">A plain sentence for a reviewer: which kit and which result make the service send it.</param>
/// <param name="Source">Where its facts and advice come from.</param>
public sealed record MessageNote(string UsedWhen, WordingMarker Marker, string Source);

/// <summary>
/// A note for every message of <see cref="MessageCatalog"/>, so a medical advisor reviewing the exported catalogue
/// knows when each sentence is sent and what it rests on. Kept beside the catalogue and keyed by code; a test
/// fails when a message has no note (a new message can't ship unreviewed) or a note names no message.
/// </summary>
public static partial class MessageNotes
{
    public static IReadOnlyDictionary<string, MessageNote> All => all.Value;

    /// <summary>Lazy for the same reason as <see cref="MessageCatalog.All"/>: the parts live in several files.</summary>
    private static readonly Lazy<IReadOnlyDictionary<string, MessageNote>> all = new(() =>
        Summaries().Concat(Care()).Concat(Results()).Concat(Soil()).Concat(Sources())
            .ToDictionary(n => n.Key, n => n.Value, StringComparer.Ordinal));

    private const string ProfileLevels = "The levels are the kit's rule profile's, each with its published source (seed-data/profiles).";

    private static MessageNote Ours(string usedWhen, string source = ProfileLevels) => new(usedWhen, WordingMarker.OurWording, source);

    private static MessageNote Published(string usedWhen, string source) => new(usedWhen, WordingMarker.Published, source);

    private static MessageNote Practice(string usedWhen, string source) => new(usedWhen, WordingMarker.Practice, source);

    private static MessageNote Memory(string usedWhen, string source) => new(usedWhen, WordingMarker.Memory, source);

    private static Dictionary<string, MessageNote> Summaries() => new()
    {
        [MessageCatalog.WaterNotDetected.Code] = Ours("Water kit, first line: every result is below the lab's reporting limit (band not detected).",
            "Our wording. A result below the reporting limit is reported as not found, never as zero (DOMAIN.md §4, common practice)."),
        [MessageCatalog.WaterLow.Code] = Ours("Water kit, first line: lead was found but every lead result is below every level (band low). Never called low as if safe.",
            "The health goal for lead is zero (40 CFR 141.51; DOMAIN.md §1). " + ProfileLevels),
        [MessageCatalog.WaterCopperAction.Code] = Published("Water kit, first line (or second, after lead at a level): copper at or above its action level.",
            "Copper action level 1.3 mg/L (40 CFR 141.80(c)); copper's own plan: EPA copper health information (DOMAIN.md §6)."),
        [MessageCatalog.SoilAboveScreening.Code] = Published("Soil kit, first line: a sample above EPA's residential screening level but below the hazard standard for its place.",
            "EPA Updated Residential Soil Lead Guidance, 2024-01-17 (200 mg/kg; 100 mg/kg with another lead source); 40 CFR 745.65 hazard standards."),
        [MessageCatalog.RetestHighShortStanding.Code] = Practice("Water kit, retest letter: the water stood too short a time and a result already reached a level; the result is shown.",
            "A first draw that stood less than 6 h is likely to read low, so a short standing time never makes a high result reassuring (DOMAIN.md §6)."),
        [MessageCatalog.RetestHighOther.Code] = Ours("Water kit, retest letter for another reason (holding time, quality control, collection) when a result already reached a level.",
            "Our wording: the bias of such a sample may go either way, so the precautions start now."),
        [MessageCatalog.ClosingSoil.Code] = Practice("Every soil kit: the last line (no water utility, service line or plumber in a soil letter).",
            "Every letter defers to the local health department and licensed professionals (DOMAIN.md §6); lead-safe certified contractors: 40 CFR 745 Subpart E."),
        [MessageCatalog.WaterAdvisory.Code] = Ours("Water kit, first line: a result at or above the caution level but below the action level (band advisory); " +
            "the caution level is the profile's advisory level or the program's Interpretation:AdvisoryLeadUgL."),
        [MessageCatalog.WaterCannotTell.Code] = Ours("Water kit, first line: band advisory only because the lab's reporting limit is at or above the level, " +
            "so the test cannot show the water is below it (for example a 1 µg/L school level)."),
        [MessageCatalog.WaterAction.Code] = Ours("Water kit, first line: a result at or above the action level, lead below the urgent level (band action)."),
        [MessageCatalog.WaterUrgent.Code] = Practice("Water kit, first line: a lead result at or above the urgent level (Interpretation:UrgentLeadUgL, default 50 µg/L).",
            "The urgent level and the call are the program's choice (common practice); bottled water for drinking, cooking and formula: EPA consumer guidance (DOMAIN.md §6)."),
        [MessageCatalog.SoilNotDetected.Code] = Ours("Soil kit, first line: no sample had lead the test could detect.",
            "Our wording. A result below the reporting limit is reported as not found, never as zero (DOMAIN.md §4, common practice)."),
        [MessageCatalog.SoilLow.Code] = Ours("Soil kit, first line: every sample is below the level for the place it was taken (band low)."),
        [MessageCatalog.SoilInconclusive.Code] = Practice("Soil kit, first line: a result within ±2 standard deviations of its level, so neither above nor below (band advisory).",
            "Comparing with ±2σ and confirming by a lab sample is common practice, with no published rule (DOMAIN.md §5)."),
        [MessageCatalog.SoilAbove.Code] = Ours("Soil kit, first line: a sample at or above the level for its place (band action)."),
        [MessageCatalog.Retest.Code] = Ours("Any kit, first line of a retest letter: a sample can't be trusted (too short a standing time, a collection problem, " +
            "outside holding time, results held by quality control, or no results at all).", "Our wording; the reasons follow (retest.*)."),
        [MessageCatalog.Corrected.Code] = Ours("Any kit, first line when the lab corrected a result after a letter had gone out; the printed letter opens " +
            "with its own paragraph instead (letter-words.corrected).", "Our wording."),
        [MessageCatalog.ClosingPublic.Code] = Practice("Every kit on public water: the last line.",
            "Every letter defers to the local health department, the water utility and licensed professionals (DOMAIN.md §6; program rule)."),
        [MessageCatalog.ClosingWell.Code] = Practice("Every kit from a private well: the last line (a well has no water utility to name).",
            "Every letter defers to the local health department and licensed professionals (DOMAIN.md §6; program rule)."),
    };
}
