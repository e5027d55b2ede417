using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Letters.Composing;

// The results table and the scales (SampleWords.cs).
internal static partial class LetterPhrases
{
    private const string Censored = "A result below the reporting limit is never written as zero (DOMAIN.md §4, common practice).";

    private static IEnumerable<LetterPhrase> Samples()
    {
        foreach (var bottle in Enum.GetValues<BottleType>().Where(b => b is not (BottleType.Soil or BottleType.Sequential)))
            yield return Fixed($"sample-words.sample.{KebabEnum.Name(bottle)}", SampleWordsFile, SampleWords.Sample(Sample(bottle, null)),
                "Results table (first column) and scale label: this bottle.");
        yield return Filled("sample-words.sample.sequential", SampleWordsFile, SampleWords.Sequential, "{position}", "3",
            "Results table (first column) and scale label: a numbered bottle of a sequential kit.");
        foreach (var place in Enum.GetValues<SoilLocation>().Select(l => (SoilLocation?)l).Append(null))
            yield return Fixed($"sample-words.sample.soil-{(place is { } p ? KebabEnum.Name(p) : "unknown")}", SampleWordsFile,
                SampleWords.Sample(Sample(BottleType.Soil, place)), "Results table (first column) and scale label: a soil sample from this place" +
                (place is null ? " (none recorded)." : "."));
        foreach (var analyte in Enum.GetValues<Analyte>())
            yield return Fixed($"sample-words.metal.{KebabEnum.Name(analyte)}", SampleWordsFile, SampleWords.Metal(analyte), "Results table, second column.");
        yield return Filled("sample-words.not-detected", SampleWordsFile, SampleWords.NotDetected, AmountPlaceholder, AmountExample,
            "Results table, third column: a result below the reporting limit ({amount} is the limit).", WordingMarker.Practice, Censored);
        yield return Fixed("sample-words.scale-not-detected", SampleWordsFile, SampleWords.NotDetectedOnScale,
            "Under a lead scale: a result below the reporting limit.", WordingMarker.Practice, Censored);
        foreach (var (name, code, when) in LevelNames)
            yield return Fixed($"sample-words.level.{code}", SampleWordsFile, name, $"Results table (fourth column) and scale marks: {when}.",
                source: "Our wording; the levels are the kit's rule profile's (seed-data/profiles) or the program's settings.");
        yield return Filled("sample-words.level", SampleWordsFile, a => SampleWords.Level(new("{name}", "{name}"), a), AmountPlaceholder, AmountExample,
            "Results table, fourth column, water: a level's name (above) and value.");
        foreach (var comparison in Enum.GetValues<SoilComparison>())
            yield return Filled($"sample-words.soil.{KebabEnum.Name(comparison)}", SampleWordsFile, a => SampleWords.SoilComparedWith(comparison, a),
                AmountPlaceholder, MessageWords.Amount(400, Units.MilligramsPerKilogram),
                "Results table, fourth column, soil: where the sample stands against the level for its place.", WordingMarker.Practice,
                "Above or below only beyond ±2σ, else not sure (DOMAIN.md §5, common practice; no published rule).");
        foreach (var comparison in Enum.GetValues<SoilComparison>())
            yield return Filled($"sample-words.soil-screening.{KebabEnum.Name(comparison)}", SampleWordsFile,
                a => SampleWords.SoilComparedWithScreening(comparison, a), AmountPlaceholder, MessageWords.Amount(200, Units.MilligramsPerKilogram),
                "Results table, fourth column, soil: where the sample stands against EPA's residential screening level.", WordingMarker.Published,
                "EPA Updated Residential Soil Lead Guidance, 2024-01-17: 200 mg/kg, 100 mg/kg with another lead source.");
        yield return Filled("sample-words.urgent-levels", SampleWordsFile, ((Phrase Action, Phrase Urgent) p) => SampleWords.UrgentLevels(p.Action, p.Urgent),
            (AmountPlaceholder, new Phrase("{urgent}", "{urgent}")), (AmountExample, MessageWords.Amount(50, Units.MicrogramsPerLiter)),
            "Results table, fourth column: an urgent lead result names the action level and the program's urgent level, as its sentence does.");
    }

    private static readonly (Phrase Name, string Code, string When)[] LevelNames =
    [
        (SampleWords.ActionLevel, "action", "the action level"),
        (SampleWords.CautionLevel, "caution", "the caution (advisory) level"),
        (SampleWords.TasteLevel, "taste", "copper's taste and staining level"),
        (SampleWords.UrgentLevel, "urgent", "the program's urgent level for lead"),
        (SampleWords.LowestLevel, "lowest", "a level whose kind the letter can't tell"),
        (SampleWords.SoilLevel, "soil", "the soil level for the sample's place"),
        (SampleWords.SoilScreeningLevel, "soil-screening", "EPA's residential soil screening level, when it decided the soil result"),
        (SampleWords.SoilHazardLevel, "soil-hazard", "the federal soil hazard standard, beside the screening level"),
    ];

    private static Finding Sample(BottleType bottle, SoilLocation? place) =>
        new(bottle, null, place, Analyte.Lead, 0, Units.MicrogramsPerLiter, false, Band.Low, null, null);
}
