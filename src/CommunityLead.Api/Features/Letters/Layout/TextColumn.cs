using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>A column of wrapped lines at a fixed place on the page, drawn top-down from where it starts.</summary>
internal sealed class TextColumn(List<Action<XGraphics>> draws, TextMeasure measure, double x, double width, double top, bool alignRight)
{
    public double Y { get; private set; } = top;

    public double HeightOf(string text, XFont font) => measure.Wrap(text, font, width).Count * Typeset.LineHeight(font);

    public void Gap(double height) => Y += height;

    public void MoveTo(double y) => Y = y;

    public void Add(string text, XFont font, XBrush brush)
    {
        foreach (var line in measure.Wrap(text, font, width))
        {
            var lineTop = Y;
            draws.Add(alignRight
                ? g => Typeset.Right(g, line, font, brush, x + width, lineTop)
                : g => Typeset.Left(g, line, font, brush, x, lineTop));
            Y += Typeset.LineHeight(font);
        }
    }
}
