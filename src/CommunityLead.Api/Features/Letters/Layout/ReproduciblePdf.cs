using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;
using PdfSharp.Pdf;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Saves so that the same content gives the same bytes: a sent letter can be re-rendered and checked against
/// its stored hash. PDFsharp 6.2.4 takes four things from the clock or a random source, all fixed here: the dates
/// (from the letter's own date), the trailer's file ID and the XMP metadata's two UUIDs (placeholders at save,
/// then a hash of the file), and the six-letter tag before each font subset's name (also from that hash).
/// Every value patched after saving keeps its length, so no offset in the cross-reference table moves.
/// </summary>
internal static partial class ReproduciblePdf
{
    private const string ZeroUuid = "00000000-0000-0000-0000-000000000000";

    public static byte[] Save(PdfDocument document, LetterContent content)
    {
        var info = document.Info;
        info.Title = DocumentTitle(content);
        info.Author = content.Program.Name;
        info.Creator = "CommunityLead";
        info.CreationDate = info.ModificationDate = LetterDate.MidnightOf(content.Date);
        document.Internals.Catalog.Language = content.Language == Rules.Households.LetterLanguage.Es ? "es" : "en";
        document.Internals.FirstDocumentID = document.Internals.SecondDocumentID = new string('\0', 16);

        // Saved plain, a letter is about 130 KB (its fonts before CompactPdf trims them): room for it from the start.
        using var stream = new MemoryStream(192 * 1024);
        document.Save(stream);
        var bytes = CompactPdf.Compress(stream.ToArray());
        Normalise(bytes);
        return bytes;
    }

    // "Your water test results — Kit code K7QM-4T2X": the composer puts the kit code first among the facts.
    private static string DocumentTitle(LetterContent content) =>
        content.KitFacts.Count == 0 ? content.Title : $"{content.Title} — {content.KitFacts[0].Label} {content.KitFacts[0].Value}";

    private static void Normalise(byte[] bytes)
    {
        // Latin-1 maps byte n to char n, so offsets in the string are offsets in the file.
        var text = Encoding.Latin1.GetString(bytes);
        var tags = SubsetTag().Matches(text);
        var uuids = XmpUuid().Matches(text);
        var ids = FileId().Match(text);
        if (!ids.Success)
            throw new InvalidOperationException("PDFsharp wrote no file ID placeholder; ReproduciblePdf needs updating.");

        foreach (Match tag in tags)
            Write(bytes, tag.Groups["tag"].Index, "AAAAAA");
        foreach (Match uuid in uuids)
            Write(bytes, uuid.Groups["uuid"].Index, ZeroUuid);
        var digest = SHA256.HashData(bytes);

        var id = Convert.ToHexString(digest, 0, 16);
        Write(bytes, ids.Groups["first"].Index, id);
        Write(bytes, ids.Groups["second"].Index, id);
        // The XMP document ID names the same 16 bytes as the trailer's ID, written as a UUID.
        var documentUuid = $"{id[..8]}-{id[8..12]}-{id[12..16]}-{id[16..20]}-{id[20..]}".ToLowerInvariant();
        foreach (Match uuid in uuids)
            Write(bytes, uuid.Groups["uuid"].Index, documentUuid);
        var faces = tags.Select(t => t.Groups["tag"].Value).Distinct().ToList();
        foreach (Match tag in tags)
            Write(bytes, tag.Groups["tag"].Index, Tag(digest, faces.IndexOf(tag.Groups["tag"].Value)));
    }

    /// <summary>Six capital letters, different for each subset in the file and for each letter's file.</summary>
    private static string Tag(byte[] digest, int face)
    {
        var hash = SHA256.HashData([.. digest, (byte)face]);
        return new string(hash.Take(6).Select(b => (char)('A' + b % 26)).ToArray());
    }

    private static void Write(byte[] bytes, int offset, string ascii) => Encoding.ASCII.GetBytes(ascii, 0, ascii.Length, bytes, offset);

    [GeneratedRegex(@"/(?:BaseFont|FontName)\s*/(?<tag>[A-Z]{6})\+")]
    private static partial Regex SubsetTag();

    [GeneratedRegex(@"<xmpMM:(?:DocumentID|InstanceID)>uuid:(?<uuid>[0-9a-fA-F-]{36})<")]
    private static partial Regex XmpUuid();

    [GeneratedRegex(@"/ID\s*\[\s*<(?<first>0{32})>\s*<(?<second>0{32})>\s*\]")]
    private static partial Regex FileId();
}
