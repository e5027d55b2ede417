using System.Security.Cryptography;
using System.Text;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Reading;

namespace CommunityLead.Api.Features.Wording;

/// <summary>
/// One sentence or phrase a household can read, as a medical advisor reviews it.
/// </summary>
/// <param name="Origin">"MessageCatalog" for the interpretation's messages, else the letter's source file.</param>
/// <param name="En">The text with its placeholders ("{result}"), as kept in the code.</param>
/// <param name="ExampleEn">The text filled with typical values; null when it has no placeholders.</param>
/// <param name="Reading">
/// Reading scores of the example (or the text), in each language; null for headings, labels and table cells
/// (no full stop): the formulas measure running text, and a two-word label gets meaningless figures.
/// </param>
public sealed record WordingEntry(string Code, string Origin, string UsedWhen, string En, string Es, string? ExampleEn, string? ExampleEs,
    WordingMarker Marker, string Source, ReadingScores? Reading);

/// <param name="Version">The wording version recorded on every letter (<see cref="WordingCatalogue.Version"/>).</param>
/// <param name="MessagesVersion">The interpretation messages' own version (<see cref="MessageCatalog.Version"/>).</param>
public sealed record WordingExport(string Version, string MessagesVersion, int Count, IReadOnlyList<WordingEntry> Entries);

/// <summary>
/// Every sentence the product can send a household: the interpretation's messages, then the letter's own fixed
/// words (headings, labels, table words, who to call). The version covers both, so a letter records exactly which
/// reviewed wording it was written with.
/// </summary>
public static class WordingCatalogue
{
    public const string MessagesOrigin = "MessageCatalog";

    public static WordingExport Export() => export.Value;

    /// <summary>
    /// The first 12 hex digits of the SHA-256 of every entry's code and two texts, in export order: any change of a
    /// word, in a message or in the letter's own words, gives a new version.
    /// </summary>
    public static string Version => export.Value.Version;

    private static readonly Lazy<WordingExport> export = new(Build);

    private static WordingExport Build()
    {
        var entries = Messages().Concat(LetterPhrases.All.Select(FromLetter)).ToList();
        var text = string.Join("\n", entries.Select(e => $"{e.Code}\t{e.En}\t{e.Es}"));
        var version = Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)))[..MessageCatalog.VersionLength];
        return new WordingExport(version, MessageCatalog.Version, entries.Count, entries);
    }

    private static IEnumerable<WordingEntry> Messages() =>
        MessageCatalog.All.OrderBy(t => t.Code, StringComparer.Ordinal).Select(t =>
        {
            // A message without a note fails MessageNotesTests; the export still lists it, marked unreviewed.
            var note = MessageNotes.All.GetValueOrDefault(t.Code) ?? new MessageNote("(no note yet)", WordingMarker.OurWording, "(no note yet)");
            var example = t.Placeholders.Count == 0 ? null : MessageExamples.Filled(t);
            return new WordingEntry(t.Code, MessagesOrigin, note.UsedWhen, t.En, t.Es, example?.En, example?.Es, note.Marker, note.Source,
                Scores(example?.En ?? t.En, example?.Es ?? t.Es));
        });

    private static WordingEntry FromLetter(LetterPhrase p) =>
        new(p.Code, p.File, p.UsedWhen, p.Text.En, p.Text.Es, p.Example?.En, p.Example?.Es, p.Marker, p.Source,
            Scores(p.Example?.En ?? p.Text.En, p.Example?.Es ?? p.Text.Es));

    private static ReadingScores? Scores(string en, string es) =>
        en.TrimEnd() is [.., '.' or '!' or '?'] ? ReadingScores.Of(en, es) : null;
}
