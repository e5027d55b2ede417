using CommunityLead.Api.Features.Letters;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>Everything the composer worded reaches the page, character for character, in both languages.</summary>
public class LetterTextTests
{
    public static TheoryData<string> Samples => ["en-action", "en-not-detected", "es", "en-action-a4", "es-letter"];

    internal static LetterContent Sample(string name) => name switch
    {
        "en-action" => LetterSamples.EnglishActionLevel(),
        "en-action-a4" => LetterSamples.EnglishActionLevel(PaperSize.A4),
        "en-not-detected" => LetterSamples.EnglishNotDetected(),
        "es" => LetterSamples.Spanish(),
        "es-letter" => LetterSamples.Spanish(PaperSize.Letter),
        _ => throw new ArgumentOutOfRangeException(nameof(name)),
    };

    [Theory]
    [MemberData(nameof(Samples))]
    public void Render_RealisticLetter_EveryWordOfTheContentIsPrinted(string sample)
    {
        var content = Sample(sample);
        var letter = RenderedLetter.Of(content);

        var missing = RenderedLetter.PrintedTexts(content).Where(text => !string.IsNullOrWhiteSpace(text) && !letter.Says(text)).ToList();

        Assert.True(missing.Count == 0, "Not found in the PDF:\n" + string.Join("\n", missing) + "\n--- PDF text ---\n" + letter.Text);
    }

    [Theory]
    [MemberData(nameof(Samples))]
    public void Render_RealisticLetter_NoCharacterIsReplaced(string sample)
    {
        var content = Sample(sample);
        var letter = RenderedLetter.Of(content);

        var questionMarksWritten = RenderedLetter.PrintedTexts(content).Sum(text => text.Count(c => c == '?'));
        Assert.DoesNotContain('\uFFFD', letter.Text);
        Assert.Equal(questionMarksWritten, letter.Text.Count(c => c == '?'));
    }

    [Fact]
    public void Render_SpanishLetter_AccentsSignsAndUnitsComeThrough()
    {
        var letter = RenderedLetter.Of(LetterSamples.Spanish());

        foreach (var text in new[] { "José Ángel Muñoz Peña", "6.8 µg/L", "≤ 1 µg/L", "¿Por qué importa?", "EE. UU. — Mejoras", "¡Gracias por participar!", "Página 1 de 2" })
            Assert.Contains(text, letter.Text);
    }

    [Fact]
    public void Render_EnglishLetter_ScaleShowsEachLevelWithItsNumberAndTheEnd()
    {
        var letter = RenderedLetter.Of(LetterSamples.EnglishActionLevel());

        Assert.Contains("Caution level 5", letter.Text);
        Assert.Contains("Action level 10", letter.Text);
        Assert.Contains("25 µg/L", letter.Text);
        Assert.Contains("Page 1 of 2", letter.Text);
        Assert.Contains("Page 2 of 2", letter.Text);
    }

    [Fact]
    public void Render_SoilScale_NumbersWrittenLikeTheLettersSentences()
    {
        var content = LetterSamples.EnglishActionLevel() with
        {
            Scales = [new LeadScale("Garden soil", 150, "150 mg/kg", [new(1200, "Level for this place")], 2000, "mg/kg")],
        };

        var letter = RenderedLetter.Of(content);

        Assert.Contains("Level for this place 1,200", letter.Text);
        Assert.Contains("2,000 mg/kg", letter.Text);
    }
}
