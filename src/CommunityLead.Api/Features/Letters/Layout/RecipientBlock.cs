using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The household's name and address, inside the envelope window's safe area. An address too long for the
/// window is set smaller rather than let out of it: text outside the window would be hidden by the envelope.
/// </summary>
internal sealed class RecipientBlock(IReadOnlyList<string> lines, XFont font, double x, double top)
{
    private const double Size = 10;
    private const double SmallestSize = 6;

    public static RecipientBlock Plan(IReadOnlyList<string> lines, PageGeometry page, LetterFonts fonts, TextMeasure measure)
    {
        var width = page.Window.Width - 2 * page.WindowInset;
        var height = page.Window.Height - 2 * page.WindowInset;
        var widest = lines.Select(line => measure.Width(line, fonts.Body)).DefaultIfEmpty(0).Max();
        var size = Math.Min(Size, Size * height / (Math.Max(1, lines.Count) * Typeset.LineHeight(fonts.Body)));
        if (widest > width)
            size = Math.Min(size, Size * width / widest);
        // Quarter points, so rounding can only make the text smaller, never push it past the window.
        size = Math.Max(SmallestSize, Math.Floor(size * 4) / 4);
        var font = size >= Size ? fonts.Body : LetterFonts.Sized(size);
        return new RecipientBlock(lines, font, page.Window.X + page.WindowInset, page.Window.Y + page.WindowInset);
    }

    public void Draw(XGraphics g)
    {
        var lineHeight = Typeset.LineHeight(font);
        for (var i = 0; i < lines.Count; i++)
            Typeset.Left(g, lines[i], font, Palette.Ink, x, top + i * lineHeight);
    }
}
