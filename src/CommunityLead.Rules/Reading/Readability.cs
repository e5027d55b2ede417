namespace CommunityLead.Rules.Reading;

/// <summary>Sentences, words and syllables of a text, as the readability formulas count them.</summary>
public sealed record TextCounts(int Sentences, int Words, int Syllables);

/// <summary>
/// Flesch reading ease and Flesch–Kincaid grade (DOMAIN.md §7 [published: Flesch 1948; Kincaid 1975]), used to
/// keep every household message at or below 8th grade.
///
/// How text is cut up (our decisions; published tools differ on these details):
/// - Words are the pieces between white space, with punctuation at either end trimmed off. A piece counts as a
///   word only if it holds a letter or a digit, so a lone dash is not a word. Numbers and units are one word
///   each: "10 µg/L" is two words, "NSF/ANSI" one.
/// - A sentence ends at a word followed by ".", "!" or "?" (closing quotes or brackets may follow). A decimal
///   point inside a number ("1.3") does not end one, nor do ":" and ";" — so a list after a colon makes a long
///   sentence, which errs towards a higher grade. Text after the last end mark is one more sentence.
/// - Syllables: <see cref="CountSyllables"/>.
/// A text without words has nothing to read: grade 0 and ease 100 by convention.
/// </summary>
public static class Readability
{
    public static double FleschKincaidGrade(string text)
    {
        var counts = Count(text);
        if (counts.Words == 0) return 0;
        return 0.39 * counts.Words / counts.Sentences + 11.8 * counts.Syllables / counts.Words - 15.59;
    }

    public static double FleschReadingEase(string text)
    {
        var counts = Count(text);
        if (counts.Words == 0) return 100;
        return 206.835 - 1.015 * counts.Words / counts.Sentences - 84.6 * counts.Syllables / counts.Words;
    }

    /// <summary>Syllables of one word as written (see <see cref="EnglishSyllables"/> for the rules).</summary>
    public static int CountSyllables(string word) => EnglishSyllables.OfToken(word);

    public static TextCounts Count(string text) => Count(text, EnglishSyllables.OfToken);

    /// <summary>The same cutting into sentences and words for any language; only the syllable rules differ.</summary>
    internal static TextCounts Count(string text, Func<string, int> syllablesOf)
    {
        int sentences = 0, words = 0, syllables = 0;
        var openSentence = false;
        foreach (var piece in text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries))
        {
            var word = piece.Trim(EdgePunctuation);
            if (word.Length == 0 || !word.Any(char.IsLetterOrDigit)) continue;
            words++;
            syllables += syllablesOf(word);
            openSentence = true;
            if (EndsSentence(piece))
            {
                sentences++;
                openSentence = false;
            }
        }
        if (openSentence) sentences++;
        return new TextCounts(sentences, words, syllables);
    }

    private static readonly char[] EdgePunctuation =
        ['.', ',', ';', ':', '!', '?', '"', '\'', '(', ')', '[', ']', '“', '”', '‘', '’', '—', '–', '-', '¿', '¡', '…'];

    private static bool EndsSentence(string piece)
    {
        var end = piece.TrimEnd('"', '\'', ')', ']', '”', '’');
        return end.Length > 0 && end[^1] is '.' or '!' or '?';
    }
}
