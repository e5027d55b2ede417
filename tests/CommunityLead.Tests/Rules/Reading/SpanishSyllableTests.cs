using CommunityLead.Rules.Reading;

namespace CommunityLead.Tests.Rules.Reading;

public class SpanishSyllableTests
{
    // Syllabified by hand by the RAE's rules on diphthong, triphthong and hiatus (Ortografía de la lengua
    // española, 2010, ch. I §3), from memory. Each word is split with a centred dot.
    [Theory]
    [InlineData("plomo", 2)]      // plo·mo
    [InlineData("agua", 2)]       // a·gua: u + a, a diphthong
    [InlineData("ciudad", 2)]     // ciu·dad: two different closed vowels, a diphthong
    [InlineData("día", 2)]        // dí·a: accented closed vowel, a hiatus
    [InlineData("país", 2)]       // pa·ís
    [InlineData("oído", 3)]       // o·í·do
    [InlineData("frío", 2)]       // frí·o
    [InlineData("reúne", 3)]      // re·ú·ne
    [InlineData("leer", 2)]       // le·er: two open vowels, a hiatus
    [InlineData("aireador", 4)]   // ai·re·a·dor
    [InlineData("océano", 4)]     // o·cé·a·no
    [InlineData("tuberías", 4)]   // tu·be·rí·as
    [InlineData("cuidado", 3)]    // cui·da·do
    [InlineData("quiero", 2)]     // quie·ro: the u of qu is silent
    [InlineData("guerra", 2)]     // gue·rra
    [InlineData("pingüino", 3)]   // pin·güi·no
    [InlineData("estudiáis", 3)]  // es·tu·diáis: a triphthong
    [InlineData("Uruguay", 3)]    // U·ru·guay: final y closes a triphthong
    [InlineData("hoy", 1)]        // final y is a vowel
    [InlineData("muy", 1)]
    [InlineData("y", 1)]
    [InlineData("ayuda", 3)]      // a·yu·da: y before a vowel is a consonant
    [InlineData("ahí", 2)]        // a·hí
    [InlineData("prohíbe", 3)]    // pro·hí·be
    [InlineData("zanahorias", 4)] // za·na·ho·rias
    [InlineData("embarazada", 5)] // em·ba·ra·za·da
    [InlineData("laboratorio", 5)] // la·bo·ra·to·rio
    [InlineData("médico", 3)]     // mé·di·co
    [InlineData("bebé", 2)]       // be·bé
    [InlineData("reemplazarla", 5)] // re·em·pla·zar·la
    [InlineData("Análisis", 4)]   // a·ná·li·sis, with a capital
    public void CountSyllables_HandSyllabifiedWords_MatchTheRaeRules(string word, int syllables) =>
        Assert.Equal(syllables, SpanishReadability.CountSyllables(word));

    // Our own rules, the same as for English (documented on WordRuns and SpanishSyllables).
    [Theory]
    [InlineData("10", 2)]         // one per digit
    [InlineData("1.3", 3)]        // "uno punto tres"
    [InlineData("1200", 4)]       // Spanish writes four digits together (MessageWords)
    [InlineData("µg/L", 3)]       // no vowel: read letter by letter
    [InlineData("NSF/ANSI", 5)]   // N-S-F + AN·SI
    [InlineData("verde-azulado", 6)] // ver·de + a·zu·la·do
    [InlineData("¿Tiene", 2)]
    public void CountSyllables_NumbersUnitsAndJoinedWords(string word, int syllables) =>
        Assert.Equal(syllables, SpanishReadability.CountSyllables(word));
}
