using CommunityLead.Api.Features.Letters;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>The text of a composed letter, whole or by part.</summary>
internal static class LetterText
{
    public static IEnumerable<LetterSection> Sections(LetterContent c) => [c.Meaning, c.Steps, c.Cautions, c.WhoToCall];

    /// <summary>Every sentence-bearing paragraph: the sections, the table note, the scales' note and the closing (no headings, labels or cells).</summary>
    public static IEnumerable<string> Paragraphs(LetterContent c) =>
        Sections(c).SelectMany(s => s.Paragraphs).Concat(c.Results is { } t ? [t.Note] : []).Concat(c.ScaleNote is { } n ? [n] : []).Append(c.Closing);

    /// <summary>The greeting and the signature's lines.</summary>
    public static IEnumerable<string> Personal(LetterContent c) =>
        new[] { c.Greeting, c.Signature?.SignOff, c.Signature?.Name, c.Signature?.Title }.OfType<string>();

    /// <summary>Headings and labels: the title, section headings, table headers and kit-fact labels.</summary>
    public static IEnumerable<string> Headings(LetterContent c) =>
        Sections(c).Select(s => s.Heading).Append(c.Title).Concat(c.Results?.Headers ?? []).Concat(c.KitFacts.Select(f => f.Label));

    public static IEnumerable<string> All(LetterContent c) =>
        new[] { c.Program.Name, c.Date, c.Title, c.Closing, c.Footer }
            .Concat(c.Program.AddressLines).Concat(c.Program.ContactLines).Concat(c.Recipient)
            .Concat(c.KitFacts.SelectMany(f => new[] { f.Label, f.Value }))
            .Concat(c.Results is { } t ? t.Headers.Concat(t.Rows.SelectMany(r => r)).Append(t.Note) : [])
            .Concat(c.Scales.SelectMany(s => s.Levels.Select(l => l.Label).Append(s.Label).Append(s.ValueText)))
            .Concat(Sections(c).SelectMany(s => s.Paragraphs.Prepend(s.Heading)))
            .Concat(c.ScaleNote is { } note ? [note] : []).Concat(Personal(c));

    public static string Joined(LetterContent c) => string.Join("\n", All(c));
}
