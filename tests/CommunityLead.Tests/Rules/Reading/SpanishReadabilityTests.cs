using CommunityLead.Rules.Reading;

namespace CommunityLead.Tests.Rules.Reading;

/// <summary>
/// Szigriszt-Pazos perspicuity (Szigriszt-Pazos 1993) on the INFLESZ scale (Barrio-Cantalejo et al. 2008), as
/// given in DOMAIN.md §7. The constants 206.835 and 62.3 and the band limits 40, 55, 65 and 80 are from memory there:
/// these tests pin what we recall, not a copy checked against the papers.
/// </summary>
public class SpanishReadabilityTests
{
    // Worked by hand (the same example as on SpanishReadability): 2 sentences, 11 words, 20 syllables —
    // el(1) a·gua(2) del(1) gri·fo(2) tie·ne(2) plo·mo(2); u·se(2) a·gua(2) frí·a(2) pa·ra(2) be·ber(2).
    // P = 206.835 − 62.3 × 20/11 − 11/2 = 88.06.
    private const string HandWorked = "El agua del grifo tiene plomo. Use agua fría para beber.";

    [Fact]
    public void Count_HandWorkedText_HasTheHandCountedTotals() =>
        Assert.Equal(new TextCounts(2, 11, 20), SpanishReadability.Count(HandWorked));

    [Fact]
    public void Perspicuity_HandWorkedText_Is88Point06() =>
        Assert.Equal(88.06, SpanishReadability.Perspicuity(HandWorked), 2);

    [Fact]
    public void Perspicuity_OpeningMarksAndUnits_CountAsTheEnglishFormulaCountsThem()
    {
        // ¿ and ¡ are trimmed like other edge punctuation; "10 µg/L" is two words of 2 and 3 syllables; 8 words in all.
        var counts = SpanishReadability.Count("¿Tiene preguntas? ¡Llámenos! El nivel es 10 µg/L.");
        Assert.Equal(new TextCounts(3, 8, 2 + 3 + 3 + 1 + 2 + 1 + 2 + 3), counts);
    }

    [Theory]
    [InlineData(39.99, InfleszBand.VeryHard)]
    [InlineData(40, InfleszBand.SomewhatHard)]
    [InlineData(54.99, InfleszBand.SomewhatHard)]
    [InlineData(55, InfleszBand.Normal)]
    [InlineData(64.99, InfleszBand.Normal)]
    [InlineData(65, InfleszBand.FairlyEasy)]
    [InlineData(80, InfleszBand.FairlyEasy)]
    [InlineData(80.01, InfleszBand.VeryEasy)]
    public void Band_InfleszLimits_PutEachScoreInItsBand(double score, InfleszBand band) =>
        Assert.Equal(band, SpanishReadability.Band(score));

    [Fact]
    public void Perspicuity_ShortPlainSentences_ScoreEasy_LongLearnedOnes_Hard()
    {
        Assert.Equal(InfleszBand.VeryEasy, SpanishReadability.Band(SpanishReadability.Perspicuity("Use agua fría. No la hierva.")));
        Assert.Equal(InfleszBand.VeryHard, SpanishReadability.Band(SpanishReadability.Perspicuity(
            "Consecuentemente, las administraciones municipales investigan sistemáticamente las características electroquímicas " +
            "de la corrosión, recomendando rehabilitaciones integrales de la infraestructura cuando las concentraciones superan los umbrales reglamentarios.")));
    }

    [Fact]
    public void EmptyText_HasNothingToRead() => Assert.Equal(100, SpanishReadability.Perspicuity(" — "));
}
