using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The result on a scale: a triangle pointing down at the value and a stroke across the bar, with the value's
/// text beside the triangle, on whichever side has room (wrapped if neither has).
/// </summary>
internal sealed class ScaleMarker(List<string> lines, XFont font, double x, bool textOnRight)
{
    private const double HalfWidth = 5;
    private const double TriangleHeight = 8;
    private const double TextGap = 4;
    private static readonly XPen Stroke = new(Palette.AccentColor, 2);

    private readonly double lineHeight = Typeset.LineHeight(font);

    public double Height => Math.Max(lines.Count * lineHeight, TriangleHeight + 2);

    public static ScaleMarker Plan(TextMeasure measure, XFont font, string text, double x, double left, double right)
    {
        var roomRight = right - (x + HalfWidth + TextGap);
        var roomLeft = x - HalfWidth - TextGap - left;
        var width = measure.Width(text, font);
        var onRight = width <= roomRight || (width > roomLeft && roomRight >= roomLeft);
        var lines = measure.Wrap(text, font, Math.Max(onRight ? roomRight : roomLeft, 1));
        return new ScaleMarker(lines, font, x, onRight);
    }

    public void Draw(XGraphics g, double top, double barTop, double barBottom)
    {
        var tip = barTop - 0.5;
        g.DrawPolygon(Palette.Accent,
            [new XPoint(x - HalfWidth, tip - TriangleHeight), new XPoint(x + HalfWidth, tip - TriangleHeight), new XPoint(x, tip)],
            XFillMode.Winding);
        g.DrawLine(Stroke, x, barTop, x, barBottom);

        // The text's last line sits level with the triangle, so the value reads as the triangle's label.
        var textTop = top + Height - lines.Count * lineHeight;
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
