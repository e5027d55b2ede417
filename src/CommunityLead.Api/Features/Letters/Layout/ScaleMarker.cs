using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The result on a scale: a triangle pointing down at the value and a stroke across the bar, with the value's text
/// beside the triangle, above the bar, on whichever side has room (wrapped if neither has). Ticks never reach above
/// the bar, so nothing crosses the value.
/// </summary>
internal sealed class ScaleMarker(List<string> lines, XFont font, double x, bool textOnRight, double textWidth)
{
    private const double HalfWidth = 4.5;
    private const double TriangleHeight = 7;
    private const double TextGap = 3;
    private static readonly XPen Stroke = new(Palette.AccentColor, 2);

    private readonly double lineHeight = Typeset.LineHeight(font);

    public double Height => Math.Max(lines.Count * lineHeight, TriangleHeight) + 1;

    /// <summary>True when the value is one line, so it can share a row with the scale's caption.</summary>
    public bool OneLine => lines.Count == 1;

    /// <summary>The horizontal extent of the triangle and the text together.</summary>
    public (double Left, double Right) Extent => textOnRight
        ? (x - HalfWidth, x + HalfWidth + TextGap + textWidth)
        : (x - HalfWidth - TextGap - textWidth, x + HalfWidth);

    public static ScaleMarker Plan(TextMeasure measure, XFont font, string text, double x, double left, double right)
    {
        var roomRight = right - (x + HalfWidth + TextGap);
        var roomLeft = x - HalfWidth - TextGap - left;
        var width = measure.Width(text, font);
        var onRight = width <= roomRight || (width > roomLeft && roomRight >= roomLeft);
        var lines = measure.Wrap(text, font, Math.Max(onRight ? roomRight : roomLeft, 1));
        return new ScaleMarker(lines, font, x, onRight, lines.Max(line => measure.Width(line, font)));
    }

    /// <param name="barTop">The triangle's tip touches it; the text's last line sits beside the triangle, just above it.</param>
    public void Draw(XGraphics g, double barTop, double barBottom)
    {
        var tip = barTop - 0.5;
        g.DrawPolygon(Palette.Accent,
            [new XPoint(x - HalfWidth, tip - TriangleHeight), new XPoint(x + HalfWidth, tip - TriangleHeight), new XPoint(x, tip)],
            XFillMode.Winding);
        g.DrawLine(Stroke, x, barTop, x, barBottom);

        var textTop = barTop - 1 - lines.Count * lineHeight;
        for (var i = 0; i < lines.Count; i++)
        {
            var lineTop = textTop + i * lineHeight;
            if (textOnRight)
                Typeset.Left(g, lines[i], font, Palette.Ink, x + HalfWidth + TextGap, lineTop);
            else
                Typeset.Right(g, lines[i], font, Palette.Ink, x - HalfWidth - TextGap, lineTop);
        }
    }
}
