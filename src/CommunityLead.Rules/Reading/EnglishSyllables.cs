namespace CommunityLead.Rules.Reading;

/// <summary>
/// Counts English syllables by rule, the usual way readability tools do; no dictionary. A word as written is
/// cut into runs of letters and runs of digits (<see cref="WordRuns"/>), and the runs are counted and added up
/// ("blue-green" = 1 + 1):
/// - Letters with a vowel (a e i o u, and y except at the start of a run): one syllable per group of vowels
///   next to each other ("water" wa·ter = 2, "lead" = 1), then these endings, each taken off only when the word
///   would keep at least one syllable:
///   silent final e ("home" = 1), but not after another vowel ("free") nor in consonant + le ("bottle" = 2);
///   -ed silent ("used" = 1) except after t, d or a vowel ("tested" = 2, "certified" = 3);
///   -es silent ("pipes" = 1) except after s, x, z, c, g, ch, sh, consonant + l or a vowel
///   ("uses", "boxes", "places", "tables" = 2);
///   -ely after a consonant loses its e ("safely" = 2);
///   a vowel before a final -ing starts a new syllable ("being" = 2, "going" = 2).
///   Known misses: words where two vowels side by side are sounded apart ("area", "idea", "quiet") count
///   one syllable short; "every" and "maybe" count one too many.
/// - Letters with no vowel are abbreviations or unit symbols, read letter by letter: one syllable each
///   ("NSF" = 3, "µg/L" = 2 + 1 = 3, "mg/kg" = 4).
/// - Digits: one syllable per digit, and one more for a decimal point between digits ("10" = 2, "1.3" = 3,
///   "1,200" = 4): close to how numbers are read aloud ("six", "thirty", "four hundred", "one point three").
/// Every word has at least one syllable.
/// </summary>
internal static class EnglishSyllables
{
    public static int OfToken(string token) => WordRuns.Syllables(token, OfLetters);

    private static int OfLetters(string w)
    {
        var groups = 0;
        for (var i = 0; i < w.Length; i++)
            if (IsVowel(w, i) && (i == 0 || !IsVowel(w, i - 1))) groups++;
        if (groups == 0) return w.Length;

        var silent = 0;
        if (EndsWithSilentE(w)) silent = 1;
        else if (w.EndsWith("ed") && w.Length > 2 && !IsVowel(w, w.Length - 3) && w[^3] is not ('t' or 'd')) silent = 1;
        else if (w.EndsWith("es") && w.Length > 2 && EsIsSilent(w)) silent = 1;
        else if (w.EndsWith("ely") && w.Length > 3 && !IsVowel(w, w.Length - 4)) silent = 1;
        var count = groups - silent;
        if (w.EndsWith("ing") && w.Length > 3 && IsVowel(w, w.Length - 4)) count++;
        return Math.Max(1, count == 0 ? groups : count);
    }

    private static bool EndsWithSilentE(string w) =>
        w.Length > 2 && w[^1] == 'e' && !IsVowel(w, w.Length - 2)
        && !(w[^2] == 'l' && !IsVowel(w, w.Length - 3));

    private static bool EsIsSilent(string w)
    {
        var before = w[..^2];
        if (IsVowel(before, before.Length - 1)) return false;
        if (before[^1] is 's' or 'x' or 'z' or 'c' or 'g') return false;
        if (before.EndsWith("ch") || before.EndsWith("sh")) return false;
        return !(before[^1] == 'l' && before.Length > 1 && !IsVowel(before, before.Length - 2));
    }

    private static bool IsVowel(string w, int i) =>
        w[i] is 'a' or 'e' or 'i' or 'o' or 'u' || (w[i] == 'y' && i > 0);
}
