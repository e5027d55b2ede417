using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The levels on a scale: a tick across the bar at each, its label centred under it. Labels that would touch
/// drop to a further row instead of overlapping; none is left out.
/// </summary>
internal sealed class ScaleTicks(List<ScaleTicks.Label> labels, double[] rowTops, XFont font, double height)
{
    private const double LabelGap = 8;

    internal sealed record Label(double Tick, double Left, int Row, List<string> Lines);

    public double Height => height;

    public static ScaleTicks Plan(
        TextMeasure measure, XFont font, IEnumerable<ScaleMark> levels, Func<double, double> xOf, double left, double right)
    {
        var labels = new List<Label>();
        var rowEnds = new List<double>();
        var rowLines = new List<int>();
        foreach (var level in levels.OrderBy(l => l.Value))
        {
            var tick = xOf(level.Value);
            var lines = measure.Wrap(level.Label, font, (right - left) / 2);
            var width = lines.Max(line => measure.Width(line, font));
            var labelLeft = Math.Clamp(tick - width / 2, left, Math.Max(left, right - width));
            var row = rowEnds.FindIndex(end => end + LabelGap <= labelLeft);
            if (row < 0)
            {
                row = rowEnds.Count;
                rowEnds.Add(0);
                rowLines.Add(0);
            }
            rowEnds[row] = labelLeft + width;
            rowLines[row] = Math.Max(rowLines[row], lines.Count);
            labels.Add(new Label(tick, labelLeft, row, lines));
        }
        var lineHeight = Typeset.LineHeight(font);
        var rowTops = rowLines.Select((_, r) => rowLines.Take(r).Sum() * lineHeight).ToArray();
        return new ScaleTicks(labels, rowTops, font, rowLines.Sum() * lineHeight);
    }

    public void Draw(XGraphics g, double tickTop, double tickBottom, double labelsTop)
    {
        var lineHeight = Typeset.LineHeight(font);
        foreach (var label in labels)
        {
            g.DrawLine(Palette.Tick, label.Tick, tickTop, label.Tick, tickBottom);
            for (var i = 0; i < label.Lines.Count; i++)
                Typeset.Left(g, label.Lines[i], font, Palette.Ink, label.Left, labelsTop + rowTops[label.Row] + i * lineHeight);
        }
    }
}
