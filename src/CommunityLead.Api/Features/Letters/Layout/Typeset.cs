using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>Draws single lines of text in a line box: top edge in, baseline worked out from the font's metrics.</summary>
internal static class Typeset
{
    private const double Leading = 1.32;

    private static readonly XStringFormat RightAligned = XStringFormats.BaseLineRight;

    public static double LineHeight(XFont font) => font.Size * Leading;

    public static double Baseline(XFont font, double top)
    {
        var metrics = font.Metrics;
        var ascent = font.Size * metrics.Ascent / metrics.UnitsPerEm;
        var descent = font.Size * Math.Abs(metrics.Descent) / metrics.UnitsPerEm;
        return top + (LineHeight(font) - ascent - descent) / 2 + ascent;
    }

    public static void Left(XGraphics g, string text, XFont font, XBrush brush, double x, double top) =>
        g.DrawString(text, font, brush, x, Baseline(font, top));

    public static void Right(XGraphics g, string text, XFont font, XBrush brush, double right, double top) =>
        g.DrawString(text, font, brush, right, Baseline(font, top), RightAligned);
}
