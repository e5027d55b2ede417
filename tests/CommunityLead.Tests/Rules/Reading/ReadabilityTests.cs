using CommunityLead.Rules.Reading;

namespace CommunityLead.Tests.Rules.Reading;

public class ReadabilityTests
{
    // Published formulas (Kincaid 1975; Flesch 1948; DOMAIN.md §7): at 15 words per sentence and 1.5 syllables
    // per word, reading ease = 206.835 − 1.015·15 − 84.6·1.5 = 64.71 and grade = 0.39·15 + 11.8·1.5 − 15.59 = 7.96.
    // The text: 2 sentences of 15 words, 45 syllables — 15 words of one syllable and 15 of two (water, garden,
    // yellow, window, paper, little, river, happy, morning, table, basket, pencil, button, silver, winter),
    // syllables per Merriam-Webster's syllabification, from memory.
    private const string FifteenByOnePointFive =
        "The dog sat by the water in the garden with a yellow window and paper. " +
        "A little river ran past the happy morning table, basket, pencil, button, silver winter hat.";

    [Fact]
    public void Counts_PublishedCheckText_HasTheIntendedRatios()
    {
        Assert.Equal(new TextCounts(2, 30, 45), Readability.Count(FifteenByOnePointFive));
    }

    [Fact]
    public void FleschReadingEase_PublishedCheck_Is64Point71() =>
        Assert.Equal(64.71, Readability.FleschReadingEase(FifteenByOnePointFive), 2);

    [Fact]
    public void FleschKincaidGrade_PublishedCheck_Is7Point96() =>
        Assert.Equal(7.96, Readability.FleschKincaidGrade(FifteenByOnePointFive), 2);

    [Fact]
    public void Count_NumbersAndUnits_AreOneWordEach_AndDecimalsDoNotEndSentences()
    {
        var counts = Readability.Count("Lead was 12.5 µg/L. The action level is 10 µg/L!");
        Assert.Equal((2, 10), (counts.Sentences, counts.Words));
    }

    [Fact]
    public void Count_DashesAndBulletsAreNotWords_AndTextWithoutAFullStopIsOneSentence()
    {
        var counts = Readability.Count("First bottle — no lead found");
        Assert.Equal((1, 5), (counts.Sentences, counts.Words));
    }

    [Fact]
    public void Count_ClosingBracketAfterFullStop_StillEndsTheSentence() =>
        Assert.Equal(2, Readability.Count("Clean the aerator (the small screen.) Then run the tap.").Sentences);

    [Fact]
    public void EmptyText_HasNothingToRead()
    {
        Assert.Equal(0, Readability.FleschKincaidGrade(""));
        Assert.Equal(100, Readability.FleschReadingEase("  — "));
    }

    [Fact]
    public void ShortWordsAndSentences_ScoreLow_LongOnesHigh()
    {
        Assert.True(Readability.FleschKincaidGrade("Run the tap. Use cold water.") < 2);
        Assert.True(Readability.FleschKincaidGrade(
            "Consequently, municipal utilities systematically investigate corrosion characteristics, recommending comprehensive " +
            "infrastructure rehabilitation whenever concentrations exceed regulatory thresholds.") > 16);
    }
}
