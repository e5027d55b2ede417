using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Sampling;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>
/// Builds a household's letter from its kit's interpretation: pure (no database, no HTTP, no clock), so the same
/// inputs always give the same content and a sent letter can be rendered again exactly.
/// </summary>
public static class LetterComposer
{
    /// <param name="profileName">The rule profile's human name (<see cref="RuleProfile.Name"/>), named under the table.</param>
    /// <param name="kind">Retest exactly when the interpretation's band is Retest; Corrected when a result changed after an earlier letter.</param>
    /// <param name="levels">
    /// The levels the kit was judged against (<see cref="LetterLevels.For"/>), so the scales show the caution, action and
    /// urgent levels by name. Without them the letter shows only the levels the findings themselves record.
    /// </param>
    public static LetterContent Compose(KitOutcome interpretation, string profileName, LetterRecipient recipient, LetterLanguage language,
        LetterKind kind, string kitCode, DateOnly collectedOn, DateOnly letterDate, bool privateWell, bool childOrPregnancy,
        LetterSettings settings, LetterLevels? levels = null)
    {
        Check(interpretation, kind, levels);
        levels ??= LetterLevels.FromFindings(interpretation.Findings);
        var soil = IsSoil(interpretation);
        var retest = kind == LetterKind.Retest;
        var sections = MessageSections.Sort(interpretation.Messages, language, kind);
        var closing = sections.Closing
            ?? (privateWell ? MessageCatalog.ClosingWell : MessageCatalog.ClosingPublic).Fill().In(language);
        IReadOnlyList<LeadScale> scales = retest ? [] : LeadScales.For(interpretation.Findings, levels, language);

        return new LetterContent(language, kind, settings.Paper,
            Contacts.Program(settings, language),
            LetterDates.Write(letterDate, language),
            Contacts.Recipient(recipient),
            LetterWords.Title(kind, soil).In(language),
            KitFacts(kitCode, collectedOn, soil, language),
            retest && !ShowsHighResults(interpretation) ? null : ResultRows.Table(interpretation.Findings, levels, profileName, language),
            scales,
            new LetterSection((retest ? LetterWords.RetestHeading : LetterWords.MeaningHeading).In(language), sections.Meaning),
            new LetterSection(LetterWords.StepsHeading.In(language), sections.Steps, Numbered: true),
            new LetterSection(LetterWords.CautionsHeading.In(language), sections.Cautions),
            new LetterSection(LetterWords.WhoToCallHeading.In(language), Contacts.WhoToCall(settings, language, privateWell, childOrPregnancy, soil)),
            closing,
            LetterWords.Footer(settings.ProgramName, kitCode).In(language),
            LetterWords.Greeting(recipient.Name).In(language),
            Contacts.Signature(settings, language),
            scales.Any(s => s.BreakAt is not null) ? LetterWords.ScaleBreakNote.In(language) : null);
    }

    private static IReadOnlyList<LabeledValue> KitFacts(string kitCode, DateOnly collectedOn, bool soil, LetterLanguage language)
    {
        List<LabeledValue> facts =
        [
            new(LetterWords.KitCode.In(language), kitCode),
            new(LetterWords.CollectedOn.In(language), LetterDates.Write(collectedOn, language)),
        ];
        if (soil) facts.Add(new(LetterWords.TestKind.In(language), LetterWords.SoilTest.In(language)));
        return facts;
    }

    /// <summary>
    /// A retest letter gives no numbers, except when a result already reached a level: then the household sees it
    /// (the interpreter says so with a retest.high-* message), since a doubtful sample is no reason to hide a danger.
    /// </summary>
    private static bool ShowsHighResults(KitOutcome interpretation) =>
        interpretation.Messages.Any(m => m.Code == MessageCatalog.RetestHighShortStanding.Code || m.Code == MessageCatalog.RetestHighOther.Code);

    /// <summary>A soil kit has soil findings, or (a retest with nothing to judge) the soil retest step.</summary>
    private static bool IsSoil(KitOutcome interpretation) =>
        interpretation.Findings.Any(f => f.Bottle == BottleType.Soil)
        || interpretation.Messages.Any(m => m.Code == MessageCatalog.StepRetestSoil.Code);

    /// <summary>
    /// A retest letter gives no numbers and a results letter must not be sent for a sample we can't trust; levels
    /// from another profile or version would name levels the kit was never judged against.
    /// </summary>
    private static void Check(KitOutcome interpretation, LetterKind kind, LetterLevels? levels)
    {
        if ((kind == LetterKind.Retest) != (interpretation.Band == Band.Retest))
            throw new ArgumentException($"A {kind} letter can't be written for an interpretation with band {interpretation.Band}.", nameof(kind));
        if (levels?.ProfileId is { } id && (id != interpretation.ProfileId || levels.ProfileVersion != interpretation.ProfileVersion))
            throw new ArgumentException(
                $"The levels are from profile {id} v{levels.ProfileVersion}; the kit was judged by {interpretation.ProfileId} v{interpretation.ProfileVersion}.",
                nameof(levels));
    }
}
