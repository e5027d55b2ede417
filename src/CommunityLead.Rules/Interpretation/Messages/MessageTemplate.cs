using System.Text.RegularExpressions;

namespace CommunityLead.Rules.Interpretation;

/// <summary>A bit of text in both letter languages: a filled-in value, or a whole message.</summary>
public sealed record Phrase(string En, string Es);

/// <summary>
/// One message before its values are filled in. Placeholders are names in braces ("{result}"); English and
/// Spanish use the same ones, each filled with a value written for that language.
/// </summary>
public sealed partial record MessageTemplate(string Code, string En, string Es)
{
    public IReadOnlyList<string> Placeholders => [.. Names(En).Union(Names(Es))];

    public Message Fill(IReadOnlyDictionary<string, Phrase>? values = null) =>
        new(Code, Replace(En, values, p => p.En), Replace(Es, values, p => p.Es));

    private string Replace(string text, IReadOnlyDictionary<string, Phrase>? values, Func<Phrase, string> language) =>
        Placeholder().Replace(text, m => values is not null && values.TryGetValue(m.Groups[1].Value, out var value)
            ? language(value)
            : throw new ArgumentException($"Message {Code} needs a value for {{{m.Groups[1].Value}}}.", nameof(values)));

    private static IEnumerable<string> Names(string text) => Placeholder().Matches(text).Select(m => m.Groups[1].Value);

    [GeneratedRegex(@"\{(\w+)\}")]
    private static partial Regex Placeholder();
}
