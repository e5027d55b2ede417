using System.Reflection;
using PdfSharp.Fonts;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Serves the embedded Liberation Sans faces (OFL, licence beside the files) to PDFsharp, so letters look the
/// same on every machine and accents render. Any family name resolves to Liberation Sans: the letters use no other.
/// </summary>
public sealed class LetterFontResolver : IFontResolver
{
    public const string FamilyName = "Liberation Sans";

    // Face names are keys in PDFsharp's process-wide font cache: prefixed so no other resolver's faces collide.
    private const string Regular = "LiberationSans-Regular";
    private const string Bold = "LiberationSans-Bold";
    private const string Italic = "LiberationSans-Italic";
    private const string ResourcePrefix = "CommunityLead.Api.Features.Letters.Fonts.";

    // Read once: PDFsharp caches the faces itself, but a resolver must never do I/O per letter.
    private readonly Dictionary<string, byte[]> fonts = new[] { Regular, Bold, Italic }.ToDictionary(face => face, Load);

    public FontResolverInfo? ResolveTypeface(string familyName, bool bold, bool italic) =>
        // No bold-italic file: the letters never ask for it, and PDFsharp simulates the slant if anyone does.
        (bold, italic) switch
        {
            (true, false) => new FontResolverInfo(Bold),
            (false, true) => new FontResolverInfo(Italic),
            (true, true) => new FontResolverInfo(Bold, mustSimulateBold: false, mustSimulateItalic: true),
            _ => new FontResolverInfo(Regular),
        };

    public byte[]? GetFont(string faceName) => fonts.GetValueOrDefault(faceName);

    private static byte[] Load(string face)
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream(ResourcePrefix + face + ".ttf")
            ?? throw new InvalidOperationException($"The embedded font {face}.ttf is missing from the build.");
        using var copy = new MemoryStream();
        stream.CopyTo(copy);
        return copy.ToArray();
    }
}
