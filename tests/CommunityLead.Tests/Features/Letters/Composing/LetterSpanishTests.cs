using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>A Spanish household gets its whole letter in Spanish: headings, labels, table, dates and messages.</summary>
public class LetterSpanishTests
{
    [Fact]
    public void Compose_SpanishHousehold_HasNoEnglishHeadingsOrLabels()
    {
        foreach (var @case in English.Append(Spanish))
        {
            var english = LetterText.Headings(@case.Compose(LetterLanguage.En)).ToHashSet();
            var spanish = LetterText.Headings(@case.Compose(LetterLanguage.Es)).ToList();

            var shared = spanish.Where(english.Contains).ToList();
            Assert.True(shared.Count == 0, $"{@case.Name}: English in the Spanish letter: {string.Join(" | ", shared)}");
        }
    }

    [Fact]
    public void Compose_SpanishHousehold_SectionsTitleAndTableInSpanish()
    {
        var letter = Spanish.Compose();

        Assert.Equal(LetterLanguage.Es, letter.Language);
        Assert.Equal("Resultados de la prueba de su agua", letter.Title);
        Assert.Equal(["Qué significan sus resultados", "Qué hacer ahora", "Tenga en cuenta", "A quién llamar"],
            LetterText.Sections(letter).Select(s => s.Heading));
        Assert.Equal(["Muestra", "Análisis", "Resultado", "Comparado con"], letter.Results!.Headers);
        Assert.Equal(["Primera agua del grifo (primera extracción)", "Plomo", "12.4 µg/L", "Nivel de acción: 10 µg/L"], letter.Results.Rows[0]);
        Assert.Equal("3 de abril de 2026", letter.Date);
        Assert.Contains(letter.KitFacts, f => f is { Label: "Fecha de la muestra", Value: "2 de abril de 2026" });
        Assert.Equal("Nivel de acción", letter.Scales[0].Levels.Single().Label);
    }

    [Fact]
    public void Compose_SpanishHousehold_MessagesAreTheSpanishOnes()
    {
        var letter = Spanish.Compose();

        foreach (var message in Spanish.Interpretation.Messages)
            Assert.Contains(message.Es, LetterText.All(letter));
        Assert.Contains("no es un consejo médico", letter.Closing);
        Assert.Contains(letter.WhoToCall.Paragraphs, p => p.StartsWith($"Llame a {Settings.HealthDepartmentName} al {Settings.HealthDepartmentPhone}."));
        Assert.Contains(letter.WhoToCall.Paragraphs, p => p.Contains("su médico"));
        Assert.DoesNotContain(MessageCatalog.ClosingPublic.En, LetterText.All(letter));
    }

    [Fact]
    public void Compose_SpanishNotDetected_WrittenInSpanish()
    {
        var letter = Low.Compose(LetterLanguage.Es);

        Assert.Contains(letter.Results!.Rows, r => r[2] == "No detectado (menos de 1 µg/L)");
        Assert.Contains("no detectado", letter.Scales.Select(s => s.ValueText));
    }

    [Fact]
    public void Compose_SpanishRetestAndCorrected_OwnTitles()
    {
        Assert.Equal("Por favor, vuelva a hacer la prueba de su agua", Retest.Compose(LetterLanguage.Es).Title);
        var corrected = Corrected.Compose(LetterLanguage.Es);
        Assert.Equal("Resultados corregidos de la prueba de su agua", corrected.Title);
        Assert.StartsWith("En una carta anterior", corrected.Meaning.Paragraphs[0]);
    }
}
