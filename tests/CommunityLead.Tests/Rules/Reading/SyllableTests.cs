using CommunityLead.Rules.Reading;

namespace CommunityLead.Tests.Rules.Reading;

public class SyllableTests
{
    // Expected counts follow Merriam-Webster's syllabification (the centred dots in its entries), from memory.
    [Theory]
    [InlineData("the", 1)]
    [InlineData("you", 1)]
    [InlineData("lead", 1)]
    [InlineData("health", 1)]
    [InlineData("home", 1)]
    [InlineData("whole", 1)]
    [InlineData("used", 1)]
    [InlineData("pipes", 1)]
    [InlineData("makes", 1)]
    [InlineData("free", 1)]
    [InlineData("eye", 1)]
    [InlineData("water", 2)]      // wa·ter
    [InlineData("children", 2)]   // chil·dren
    [InlineData("filter", 2)]     // fil·ter
    [InlineData("bottle", 2)]     // bot·tle
    [InlineData("table", 2)]      // ta·ble
    [InlineData("people", 2)]     // peo·ple
    [InlineData("simple", 2)]     // sim·ple
    [InlineData("tested", 2)]     // test·ed
    [InlineData("needed", 2)]     // need·ed
    [InlineData("boxes", 2)]      // box·es
    [InlineData("places", 2)]     // plac·es
    [InlineData("safely", 2)]     // safe·ly
    [InlineData("being", 2)]      // be·ing
    [InlineData("doctor", 2)]     // doc·tor
    [InlineData("pregnant", 2)]   // preg·nant
    [InlineData("faucet", 2)]     // fau·cet
    [InlineData("service", 2)]    // ser·vice
    [InlineData("advice", 2)]     // ad·vice
    [InlineData("because", 2)]    // be·cause
    [InlineData("minutes", 2)]    // min·utes
    [InlineData("cooking", 2)]    // cook·ing
    [InlineData("baby", 2)]       // ba·by
    [InlineData("certified", 3)]  // cer·ti·fied
    [InlineData("formula", 3)]    // for·mu·la
    [InlineData("department", 3)] // de·part·ment
    [InlineData("medical", 3)]    // med·i·cal
    [InlineData("galvanized", 3)] // gal·va·nized
    [InlineData("aerator", 3)]    // aer·a·tor
    [InlineData("utility", 4)]    // u·til·i·ty
    [InlineData("professional", 4)] // pro·fes·sion·al
    public void CountSyllables_CommonWords_MatchTheDictionary(string word, int syllables) =>
        Assert.Equal(syllables, Readability.CountSyllables(word));

    // Our own rules for what a dictionary doesn't cover (documented on EnglishSyllables).
    [Theory]
    [InlineData("10", 2)]         // one per digit
    [InlineData("1.3", 3)]        // "one point three"
    [InlineData("1,200", 4)]
    [InlineData("µg/L", 3)]       // no vowel: read letter by letter
    [InlineData("NSF/ANSI", 5)]   // N-S-F + AN·SI
    [InlineData("blue-green", 2)]
    [InlineData("don't", 1)]
    [InlineData("Water,", 2)]
    [InlineData("a", 1)]
    public void CountSyllables_NumbersUnitsAndJoinedWords(string word, int syllables) =>
        Assert.Equal(syllables, Readability.CountSyllables(word));
}
