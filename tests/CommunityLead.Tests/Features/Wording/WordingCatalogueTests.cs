using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Reading;

namespace CommunityLead.Tests.Features.Wording;

/// <summary>The exported catalogue is the code's wording, all of it, under one version.</summary>
public class WordingCatalogueTests
{
    private static readonly WordingExport Export = WordingCatalogue.Export();

    private static IEnumerable<WordingEntry> Messages => Export.Entries.Where(e => e.Origin == WordingCatalogue.MessagesOrigin);

    private static IEnumerable<WordingEntry> LetterWording => Export.Entries.Where(e => e.Origin != WordingCatalogue.MessagesOrigin);

    [Fact]
    public void Export_MessageEntries_AreExactlyTheCatalogue_TextsAndVersion()
    {
        var catalogue = MessageCatalog.All.ToDictionary(t => t.Code);
        Assert.Equal(catalogue.Keys.Order(StringComparer.Ordinal), Messages.Select(e => e.Code));
        Assert.All(Messages, e => Assert.Equal((catalogue[e.Code].En, catalogue[e.Code].Es), (e.En, e.Es)));
        Assert.Equal(MessageCatalog.Version, Export.MessagesVersion);
        Assert.Equal(Export.Entries.Count, Export.Count);
    }

    [Fact]
    public void Export_Codes_AreUnique_AndEveryEntryHasANote()
    {
        Assert.Equal(Export.Entries.Count, Export.Entries.Select(e => e.Code).Distinct().Count());
        Assert.All(Export.Entries, e =>
        {
            Assert.False(string.IsNullOrWhiteSpace(e.UsedWhen) || e.UsedWhen.StartsWith('('), e.Code);
            Assert.False(string.IsNullOrWhiteSpace(e.Source) || e.Source.StartsWith('('), e.Code);
            Assert.NotEqual(e.En, e.Es);
        });
        Assert.Contains(LetterWording, e => e.Origin == "LetterWords.cs");
        Assert.Contains(LetterWording, e => e.Origin == "Contacts.cs");
        Assert.Contains(LetterWording, e => e.Origin == "SampleWords.cs");
    }

    [Fact]
    public void Version_IsTheHashOfEveryCodeAndText_AndCoversTheLetterWords()
    {
        // The documented rule, computed again here: SHA-256 over "code<TAB>en<TAB>es" lines, first 12 hex digits.
        static string Hash(IEnumerable<WordingEntry> entries) => Convert.ToHexStringLower(
            SHA256.HashData(Encoding.UTF8.GetBytes(string.Join("\n", entries.Select(e => $"{e.Code}\t{e.En}\t{e.Es}")))))[..12];

        Assert.Equal(Hash(Export.Entries), WordingCatalogue.Version);
        Assert.Equal(12, WordingCatalogue.Version.Length);
        // One word of the letter's own changed gives another version.
        var changed = Export.Entries.Select(e => e.Code == "contacts.doctor" ? e with { En = e.En.Replace("doctor", "nurse") } : e);
        Assert.NotEqual(WordingCatalogue.Version, Hash(changed));
        Assert.NotEqual(MessageCatalog.Version, WordingCatalogue.Version);
    }

    [Fact]
    public void Export_ListsEveryFixedPhraseOfTheLetterWordFiles()
    {
        // Every static phrase of the three files, found by reflection so a new one can't be left out.
        var phrases = new[] { typeof(LetterWords), typeof(SampleWords), typeof(Contacts) }
            .SelectMany(type => type.GetFields(BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Static))
            .SelectMany(f => f.GetValue(null) switch { Phrase p => [p], Phrase[] many => many, _ => Array.Empty<Phrase>() })
            .ToList();
        Assert.True(phrases.Count >= 20, $"{phrases.Count} phrases");
        var listed = LetterWording.Select(e => (e.En, e.Es)).ToHashSet();
        Assert.All(phrases, p => Assert.True(listed.Contains((p.En, p.Es)), $"Not in LetterPhrases: {p.En}"));
    }

    [Fact]
    public void Export_SentencesAreScored_LabelsAreNot_AndScoresAreThoseOfTheExample()
    {
        Assert.All(Messages, e =>
        {
            Assert.NotNull(e.Reading);
            var spanish = e.ExampleEs ?? e.Es;
            Assert.Equal(Math.Round(SpanishReadability.Perspicuity(spanish), 1), e.Reading.SpanishPerspicuity);
            Assert.Equal(Math.Round(Readability.FleschKincaidGrade(e.ExampleEn ?? e.En), 1), e.Reading.EnglishGrade);
        });
        Assert.Null(Export.Entries.Single(e => e.Code == "letter-words.heading.who-to-call").Reading);
        Assert.NotNull(Export.Entries.Single(e => e.Code == "contacts.health").Reading);
    }

    [Fact]
    public void Export_EveryLetterSentence_IsGradeEightAndSpanishNormalOrEasier()
    {
        // The letter's own sentences (who to call, the corrected-letter opening, the table note), with invented
        // values, held to the same levels as the messages: EPA's grade 8 (DOMAIN.md §7) and INFLESZ "normal"
        // (Szigriszt-Pazos 1993; Barrio-Cantalejo et al. 2008; constants from memory, DOMAIN.md §7).
        var sentences = LetterWording.Where(e => e.Reading is not null).ToList();
        Assert.True(sentences.Count >= 6, $"{sentences.Count} letter sentences");
        Assert.All(sentences, e =>
        {
            Assert.True(e.Reading!.EnglishGrade <= 8, $"{e.Code}: grade {e.Reading.EnglishGrade}");
            Assert.True(e.Reading.SpanishPerspicuity >= SpanishReadability.NormalFrom, $"{e.Code}: {e.Reading.SpanishPerspicuity}");
        });
    }
}
