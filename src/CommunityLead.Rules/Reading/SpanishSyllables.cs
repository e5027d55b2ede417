namespace CommunityLead.Rules.Reading;

/// <summary>
/// Counts Spanish syllables by the spelling rules for diphthongs and hiatus (RAE, Ortografía de la lengua
/// española, 2010, ch. I §3: from memory); no dictionary. Words are cut into runs of letters and digits as in
/// English (<see cref="WordRuns"/>): numbers and unit symbols count the same in both languages.
/// - One syllable per vowel, except that two vowels side by side share one (a diphthong) unless they are in hiatus.
///   Open vowels: a, e, o (with or without an accent); closed vowels: i, u, ü.
///   Open + open is a hiatus ("leer" le·er = 2, "aireador" ai·re·a·dor = 4); an accented í or ú beside an open
///   vowel is a hiatus ("día" dí·a = 2, "país" pa·ís = 2, "oído" o·í·do = 3); otherwise open + closed, closed +
///   open and two different closed vowels make a diphthong ("agua" a·gua = 2, "ciudad" ciu·dad = 2, "cuidado"
///   cui·da·do = 3), three in a row a triphthong ("Uruguay" = 3). The same closed vowel twice is a hiatus ("chiita").
///   The u of gue, gui, que, qui is silent; it sits in the same syllable as the vowel after it, so the count holds.
/// - y is a vowel only at the end of a word ("hoy" = 1, "muy" = 1, the word "y" = 1); elsewhere a consonant
///   ("ayuda" a·yu·da = 3).
/// - h counts as a consonant ("ahí" a·hí = 2, "prohíbe" pro·hí·be = 3). Known miss: a diphthong across a silent h
///   is counted as two ("ahumado" = 4 here, a·hu·ma·do; said au·ma·do).
/// - Letters with no vowel are abbreviations or unit symbols, read letter by letter: one syllable each ("NSF" = 3).
/// </summary>
internal static class SpanishSyllables
{
    public static int OfToken(string token) => WordRuns.Syllables(token, OfLetters);

    private static int OfLetters(string w)
    {
        var syllables = 0;
        for (var i = 0; i < w.Length; i++)
        {
            if (!IsVowel(w, i)) continue;
            // A vowel right after another one joins its syllable unless the two are in hiatus.
            if (i > 0 && IsVowel(w, i - 1) && !Hiatus(w[i - 1], w[i])) continue;
            syllables++;
        }
        return syllables == 0 ? w.Length : syllables;
    }

    private static bool IsVowel(string w, int i) => IsOpen(w[i]) || IsClosed(w[i]) || IsAccentedClosed(w[i]) || (w[i] == 'y' && i == w.Length - 1);

    private static bool Hiatus(char first, char second) =>
        (IsOpen(first) && IsOpen(second))
        || (IsAccentedClosed(first) && IsOpen(second))
        || (IsOpen(first) && IsAccentedClosed(second))
        || (first == second && IsClosed(first));

    private static bool IsOpen(char c) => c is 'a' or 'e' or 'o' or 'á' or 'é' or 'ó';

    private static bool IsClosed(char c) => c is 'i' or 'u' or 'ü';

    private static bool IsAccentedClosed(char c) => c is 'í' or 'ú';
}
