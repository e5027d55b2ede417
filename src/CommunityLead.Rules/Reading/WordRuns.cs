namespace CommunityLead.Rules.Reading;

/// <summary>
/// How a word as written is cut up for counting syllables, the same in every language: into runs of letters and
/// runs of digits, counted and added up ("blue-green" = 1 + 1, "µg/L" = 2 + 1). The letters are counted by the
/// language's own rules, lower-cased and without apostrophes. Digits: one syllable per digit, and one more for a
/// decimal point between digits ("10" = 2, "1.3" = 3, "1,200" = 4): close to how numbers are read aloud in English
/// ("six", "thirty", "one point three") and in Spanish ("seis", "treinta", "uno punto tres"). Every word has at
/// least one syllable.
/// </summary>
internal static class WordRuns
{
    public static int Syllables(string token, Func<string, int> ofLetters)
    {
        var total = 0;
        var i = 0;
        while (i < token.Length)
        {
            var start = i;
            if (char.IsLetter(token[i]))
            {
                while (i < token.Length && (char.IsLetter(token[i]) || token[i] is '\'' or '’')) i++;
                total += ofLetters(token[start..i].Replace("'", "").Replace("’", "").ToLowerInvariant());
            }
            else if (char.IsDigit(token[i]))
            {
                while (i < token.Length && (char.IsDigit(token[i]) || IsInsideNumber(token, i))) i++;
                total += OfNumber(token[start..i]);
            }
            else i++;
        }
        return Math.Max(1, total);
    }

    private static bool IsInsideNumber(string token, int i) =>
        token[i] is '.' or ',' && i + 1 < token.Length && char.IsDigit(token[i + 1]);

    private static int OfNumber(string number) =>
        number.Count(char.IsDigit) + number.Count(c => c == '.');
}
