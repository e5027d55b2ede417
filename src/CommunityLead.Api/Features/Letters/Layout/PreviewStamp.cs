using PdfSharp.Drawing;
using PdfSharp.Pdf;
using PdfSharp.Pdf.IO;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Marks a rendered letter as a preview: a dark band with the banner's words across the top margin of every page,
/// above the letterhead, and one faint word across the page, so a preview is never taken for a letter to mail. The
/// letter under it is untouched: the preview is the same PDF the household would get once released.
/// </summary>
internal static class PreviewStamp
{
    private const double BandTop = 10;
    private const double Padding = 4;
    private static readonly XBrush Band = new XSolidBrush(XColor.FromArgb(0x8B, 0x1A, 0x1A));
    private static readonly XBrush BandText = XBrushes.White;
    private static readonly XBrush Watermark = new XSolidBrush(XColor.FromArgb(40, 0x8B, 0x1A, 0x1A));

    public static byte[] Apply(byte[] pdf, string banner, string watermark)
    {
        var fonts = LetterFonts.Shared;
        var bannerFont = fonts.BodyBold;
        var markFont = new XFont(LetterFontResolver.FamilyName, 72, XFontStyleEx.Bold, new XPdfFontOptions(PdfFontEncoding.Unicode));
        using var document = PdfReader.Open(new MemoryStream(pdf), PdfDocumentOpenMode.Modify);
        foreach (var page in document.Pages)
        {
            var (width, height) = (page.Width.Point, page.Height.Point);
            using var g = XGraphics.FromPdfPage(page, XGraphicsPdfPageOptions.Append);
            var margin = PageGeometry.For(PaperSize.Letter).Margin; // the same 20 mm on A4
            var lines = new TextMeasure(g).Wrap(banner, bannerFont, width - 2 * margin - 2 * Padding);
            var lineHeight = Typeset.LineHeight(bannerFont);
            g.DrawRectangle(Band, margin, BandTop, width - 2 * margin, lines.Count * lineHeight + 2 * Padding);
            for (var i = 0; i < lines.Count; i++)
                Typeset.Left(g, lines[i], bannerFont, BandText, margin + Padding, BandTop + Padding + i * lineHeight);

            // Drawn over the letter, so it shows however the page is printed; light enough to leave the text readable.
            var state = g.Save();
            g.TranslateTransform(width / 2, height / 2);
            g.RotateTransform(-35);
            g.DrawString(watermark, markFont, Watermark, 0, 0, XStringFormats.Center);
            g.Restore(state);
        }
        using var output = new MemoryStream();
        document.Save(output);
        return output.ToArray();
    }
}
