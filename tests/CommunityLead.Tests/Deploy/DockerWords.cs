using System.Text;

namespace CommunityLead.Tests.Deploy;

/// <summary>Docker's word splitting for ENV: quotes group, a backslash escapes the next character.</summary>
internal static class DockerWords
{
    /// <summary>`ENV a=1 b="two words"`, or the older `ENV name value with spaces`.</summary>
    public static IEnumerable<(string Name, string Value)> EnvPairs(string arguments)
    {
        var words = Split(arguments);
        if (words.Count > 0 && !words[0].Contains('='))
        {
            var space = arguments.IndexOfAny([' ', '\t']);
            yield return (words[0], space < 0 ? "" : arguments[(space + 1)..].Trim());
            yield break;
        }
        foreach (var word in words)
        {
            var equals = word.IndexOf('=');
            yield return (word[..equals], word[(equals + 1)..]);
        }
    }

    public static List<string> Split(string text)
    {
        var words = new List<string>();
        var word = new StringBuilder();
        var inWord = false;
        char? quote = null;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (quote is null && char.IsWhiteSpace(c))
            {
                if (inWord) words.Add(word.ToString());
                word.Clear();
                inWord = false;
                continue;
            }
            inWord = true;
            if (c == '\\' && quote != '\'' && i + 1 < text.Length) word.Append(text[++i]);
            else if (quote is null && c is '"' or '\'') quote = c;
            else if (c == quote) quote = null;
            else word.Append(c);
        }
        if (inWord) words.Add(word.ToString());
        return words;
    }
}
