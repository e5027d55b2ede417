using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>A column of wrapped lines at a fixed place on the page, drawn top-down from where it starts.</summary>
internal sealed class TextColumn(List<Action<XGraphics>> draws, TextMeasure measure, double x, double width, double top, bool alignRight)
{
    private readonly List<(double Top, double Bottom, double Left, double Right)> extents = [];

    public double Y { get; private set; } = top;

    /// <summary>Where each line drawn so far lies, so a neighbouring column can use the room beside short lines.</summary>
    public IReadOnlyList<(double Top, double Bottom, double Left, double Right)> Extents => extents;

    public double HeightOf(string text, XFont font) => measure.Wrap(text, font, width).Count * Typeset.LineHeight(font);

    public void Gap(double height) => Y += height;

    public void MoveTo(double y) => Y = y;

    public void Add(string text, XFont font, XBrush brush)
    {
        foreach (var line in measure.Wrap(text, font, width))
            AddLine(line, font, brush);
    }

    /// <summary>One line as it is, unwrapped: the caller has checked it fits where it goes.</summary>
    public void AddLine(string line, XFont font, XBrush brush)
    {
        var (lineTop, lineWidth) = (Y, measure.Width(line, font));
        draws.Add(alignRight
            ? g => Typeset.Right(g, line, font, brush, x + width, lineTop)
            : g => Typeset.Left(g, line, font, brush, x, lineTop));
        Y += Typeset.LineHeight(font);
        extents.Add(alignRight ? (lineTop, Y, x + width - lineWidth, x + width) : (lineTop, Y, x, x + lineWidth));
    }
}
