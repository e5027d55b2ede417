namespace CommunityLead.Rules.Reading;

/// <summary>The INFLESZ reading of a Szigriszt-Pazos score, hardest to easiest.</summary>
public enum InfleszBand
{
    /// <summary>Below 40 ("muy difícil").</summary>
    VeryHard,
    /// <summary>40 to 55 ("algo difícil").</summary>
    SomewhatHard,
    /// <summary>55 to 65 ("normal"): the hardest any household message may be.</summary>
    Normal,
    /// <summary>65 to 80 ("bastante fácil").</summary>
    FairlyEasy,
    /// <summary>Above 80 ("muy fácil").</summary>
    VeryEasy,
}

/// <summary>
/// Szigriszt-Pazos perspicuity, P = 206.835 − 62.3·(syllables/words) − (words/sentences) (Szigriszt-Pazos 1993),
/// read on the INFLESZ scale (Barrio-Cantalejo et al. 2008); both from DOMAIN.md §7, where the constants are marked
/// from memory. Words and sentences are cut exactly as for English (<see cref="Readability"/>); syllables by
/// <see cref="SpanishSyllables"/>. A text without words has nothing to read: 100 by convention.
///
/// Worked by hand: "El agua del grifo tiene plomo. Use agua fría para beber." is 2 sentences of 11 words:
/// el(1) a·gua(2) del(1) gri·fo(2) tie·ne(2) plo·mo(2), u·se(2) a·gua(2) frí·a(2) pa·ra(2) be·ber(2) = 20 syllables.
/// P = 206.835 − 62.3·20/11 − 11/2 = 206.835 − 113.273 − 5.5 = 88.06: very easy.
/// </summary>
public static class SpanishReadability
{
    /// <summary>The lowest score of the "normal" band: household messages must score at least this.</summary>
    public const double NormalFrom = 55;

    public static double Perspicuity(string text)
    {
        var counts = Count(text);
        if (counts.Words == 0) return 100;
        return 206.835 - 62.3 * counts.Syllables / counts.Words - (double)counts.Words / counts.Sentences;
    }

    /// <summary>
    /// The INFLESZ band. The published bands share their ends (40–55, 55–65, ...); we put a score on an end in the
    /// easier band, so 55 is normal and the "at least 55" rule reads the same as "normal or easier".
    /// </summary>
    public static InfleszBand Band(double perspicuity) => perspicuity switch
    {
        < 40 => InfleszBand.VeryHard,
        < NormalFrom => InfleszBand.SomewhatHard,
        < 65 => InfleszBand.Normal,
        <= 80 => InfleszBand.FairlyEasy,
        _ => InfleszBand.VeryEasy,
    };

    /// <summary>Syllables of one Spanish word as written (see <see cref="SpanishSyllables"/> for the rules).</summary>
    public static int CountSyllables(string word) => SpanishSyllables.OfToken(word);

    public static TextCounts Count(string text) => Readability.Count(text, SpanishSyllables.OfToken);
}
