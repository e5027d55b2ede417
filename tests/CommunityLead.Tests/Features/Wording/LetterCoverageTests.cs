using System.Text.RegularExpressions;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Rules.Households;
using CommunityLead.Tests.Features.Letters.Composing;

namespace CommunityLead.Tests.Features.Wording;

/// <summary>
/// What a medical advisor reviews is what households get: every heading, label, table word, scale label, line and
/// paragraph of every kind of letter, in both languages, is an entry of the exported catalogue (its placeholders
/// standing for any text). Only the household's and the program's own data (names, addresses, codes, dates,
/// amounts) are left out.
/// </summary>
public partial class LetterCoverageTests
{
    [Theory]
    [InlineData(LetterLanguage.En)]
    [InlineData(LetterLanguage.Es)]
    public void Compose_EveryKindOfLetter_EveryPieceOfWordingIsInTheCatalogue(LetterLanguage language)
    {
        var patterns = Patterns(language);
        Assert.DoesNotContain(patterns, p => p.IsMatch("Drink plenty of water") || p.IsMatch("Beba mucha agua: siempre"));
        var cases = LetterCases.English.Concat(LetterCases.English.Select(c => c with { Sender = LetterCases.LongNames }));
        var missing = new List<string>();
        var checkedPieces = 0;
        foreach (var letter in cases.Select(c => c.Compose(language)))
            foreach (var piece in Wording(letter))
            {
                checkedPieces++;
                if (!patterns.Any(p => p.IsMatch(piece))) missing.Add(piece);
            }
        Assert.True(checkedPieces > 200, $"{checkedPieces} pieces checked");
        Assert.True(missing.Count == 0, "Printed but not in the catalogue:\n" + string.Join("\n", missing.Distinct()));
    }

    /// <summary>Every piece of text that is wording, not data.</summary>
    private static IEnumerable<string> Wording(LetterContent c)
    {
        yield return c.Title;
        yield return c.Closing;
        yield return c.Footer;
        foreach (var s in new[] { c.Meaning, c.Steps, c.Cautions, c.WhoToCall })
        {
            yield return s.Heading;
            foreach (var p in s.Paragraphs) yield return p;
        }
        foreach (var f in c.KitFacts)
        {
            yield return f.Label;
            if (f.Label is "Test" or "Prueba") yield return f.Value;
        }
        // "Phone: +1 555 0100": the label is wording, the number is the program's.
        foreach (var line in c.Program.ContactLines.Where(l => l.Contains(": ")))
            yield return line[..line.IndexOf(": ", StringComparison.Ordinal)];
        if (c.Results is { } table)
        {
            foreach (var h in table.Headers) yield return h;
            yield return table.Note;
            foreach (var row in table.Rows)
            {
                yield return row[0];
                yield return row[1];
                if (!Amount().IsMatch(row[2])) yield return row[2];
                if (row[3] != "—") yield return row[3];
            }
        }
        foreach (var scale in c.Scales)
        {
            yield return scale.Label;
            if (!Amount().IsMatch(scale.ValueText)) yield return scale.ValueText;
            foreach (var mark in scale.Levels) yield return mark.Label;
        }
    }

    /// <summary>
    /// Each entry's text with its placeholders ("{result}") standing for any text. The one entry made only of
    /// placeholders, a level's name and value, has its name filled with each level name instead, so that it
    /// does not match everything.
    /// </summary>
    private static List<Regex> Patterns(LetterLanguage language)
    {
        var entries = WordingCatalogue.Export().Entries.ToDictionary(e => e.Code, e => language == LetterLanguage.Es ? e.Es : e.En);
        var names = entries.Where(e => e.Key.StartsWith("sample-words.level.", StringComparison.Ordinal)).Select(e => e.Value).ToList();
        var level = entries["sample-words.level"];
        return
        [
            .. entries.Where(e => e.Key != "sample-words.level").Select(e => Pattern(e.Value)),
            .. names.Select(name => Pattern(level.Replace("{name}", name))),
        ];
    }

    private static Regex Pattern(string text) =>
        new("^" + Placeholder().Replace(Regex.Escape(text), ".+?") + "$", RegexOptions.Singleline);

    [GeneratedRegex(@"\\\{\w+\}")]
    private static partial Regex Placeholder();

    [GeneratedRegex(@"^\d[\d.,\u00A0]* (µg/L|mg/L|mg/kg)$")]
    private static partial Regex Amount();
}
