using PdfSharp.Drawing;
using PdfSharp.Fonts;
using PdfSharp.Pdf;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The few fonts a letter uses, made once per process: creating an XFont is costly and a mailing is thousands of
/// letters. Unicode encoding so µ, ≤, ñ, á, ¿ and — are written as themselves, never as "?".
/// </summary>
internal sealed class LetterFonts
{
    private static readonly XPdfFontOptions Unicode = new(PdfFontEncoding.Unicode);

    // Lazy's default mode runs Create once even when many letters start at the same moment.
    private static readonly Lazy<LetterFonts> shared = new(Create);

    private LetterFonts()
    {
    }

    public static LetterFonts Shared => shared.Value;

    public XFont ProgramName { get; } = Make(15, XFontStyleEx.Bold);
    public XFont Title { get; } = Make(14, XFontStyleEx.Bold);
    public XFont Heading { get; } = Make(11.5, XFontStyleEx.Bold);
    public XFont Body { get; } = Make(10, XFontStyleEx.Regular);
    public XFont BodyBold { get; } = Make(10, XFontStyleEx.Bold);
    public XFont Small { get; } = Make(8.5, XFontStyleEx.Regular);
    public XFont SmallItalic { get; } = Make(8.5, XFontStyleEx.Italic);
    public XFont Tiny { get; } = Make(7.5, XFontStyleEx.Regular);

    /// <summary>A regular face at another size, for text that must shrink to fit a fixed box (the envelope window).</summary>
    public static XFont Sized(double size) => Make(size, XFontStyleEx.Regular);

    /// <summary>A bold face at another size (kit labels: the code printed as text).</summary>
    public static XFont SizedBold(double size)
    {
        _ = Shared; // installs the font resolver first
        return Make(size, XFontStyleEx.Bold);
    }

    private static XFont Make(double size, XFontStyleEx style) => new(LetterFontResolver.FamilyName, size, style, Unicode);

    /// <summary>
    /// Installs our resolver if the process has none yet (PDFsharp takes one resolver per process, set before any
    /// font is used). A resolver installed elsewhere is kept, as long as it serves our family.
    /// </summary>
    private static LetterFonts Create()
    {
        GlobalFontSettings.FontResolver ??= new LetterFontResolver();
        if (GlobalFontSettings.FontResolver.ResolveTypeface(LetterFontResolver.FamilyName, false, false) is null)
            throw new InvalidOperationException(
                $"Another PDFsharp font resolver is installed and cannot serve '{LetterFontResolver.FamilyName}'.");
        return new LetterFonts();
    }
}
