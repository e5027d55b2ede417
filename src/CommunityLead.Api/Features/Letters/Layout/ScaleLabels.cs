using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The words under a scale's bar: the axis numbers (0, the break, the end) and each level's label. A level's label
/// is centred under its tick if there is room, else slid sideways as long as it still spans its tick, else moved to
/// a further row; nothing overlaps and none is left out. Ticks stop above the first row, so no label crosses one.
/// </summary>
internal sealed class ScaleLabels(List<ScaleLabels.Label> labels, double[] rowTops, XFont font, double height)
{
    private const double LabelGap = 8;
    private const double Epsilon = 1e-6;

    internal sealed record Label(double Left, int Row, List<string> Lines);

    public double Height => height;

    /// <param name="fixedLabels">Axis numbers, each at the one place it belongs (its left edge given).</param>
    /// <param name="levels">Each level's label and the x of its tick.</param>
    public static ScaleLabels Plan(TextMeasure measure, XFont font, IEnumerable<(string Text, double Left)> fixedLabels,
        IEnumerable<(string Text, double Tick)> levels, double left, double right)
    {
        var rows = new List<List<(double Left, double Right)>>();
        var rowLines = new List<int>();
        var labels = new List<Label>();

        void Place(List<string> lines, double width, double lowest, double highest, double ideal)
        {
            for (var row = 0; ; row++)
            {
                if (row == rows.Count)
                {
                    rows.Add([]);
                    rowLines.Add(0);
                }
                if (FreeLeft(rows[row], width, lowest, highest, ideal) is not { } at) continue;
                rows[row].Add((at, at + width));
                rowLines[row] = Math.Max(rowLines[row], lines.Count);
                labels.Add(new Label(at, row, lines));
                return;
            }
        }

        foreach (var (text, at) in fixedLabels)
        {
            var width = measure.Width(text, font);
            var fixedAt = Math.Clamp(at, left, Math.Max(left, right - width));
            Place([text], width, fixedAt, fixedAt, fixedAt);
        }
        foreach (var (text, tick) in levels.OrderBy(l => l.Tick))
        {
            var lines = measure.Wrap(text, font, (right - left) / 2);
            var width = lines.Max(line => measure.Width(line, font));
            var last = Math.Max(left, right - width);
            // Any left edge from which the label still reaches across its tick.
            var (lowest, highest) = (Math.Clamp(tick - width, left, last), Math.Clamp(tick, left, last));
            Place(lines, width, lowest, highest, Math.Clamp(tick - width / 2, lowest, highest));
        }

        var lineHeight = Typeset.LineHeight(font);
        var rowTops = rowLines.Select((_, r) => rowLines.Take(r).Sum() * lineHeight).ToArray();
        return new ScaleLabels(labels, rowTops, font, rowLines.Sum() * lineHeight);
    }

    /// <summary>The left edge nearest <paramref name="ideal"/>, within the range, that keeps the gap to every label in the row.</summary>
    private static double? FreeLeft(List<(double Left, double Right)> taken, double width, double lowest, double highest, double ideal)
    {
        bool Free(double at) => taken.All(t => at + width + LabelGap <= t.Left + Epsilon || at + Epsilon >= t.Right + LabelGap);
        var candidates = taken.SelectMany(t => new[] { t.Left - LabelGap - width, t.Right + LabelGap })
            .Prepend(ideal).Select(c => Math.Clamp(c, lowest, highest));
        return candidates.Where(Free).OrderBy(c => Math.Abs(c - ideal)).ThenBy(c => c).Cast<double?>().FirstOrDefault();
    }

    public void Draw(XGraphics g, double top)
    {
        var lineHeight = Typeset.LineHeight(font);
        // Row by row, left to right: text pulled from the PDF (screen readers, copy and paste) reads in that order.
        foreach (var label in labels.OrderBy(l => l.Row).ThenBy(l => l.Left))
            for (var i = 0; i < label.Lines.Count; i++)
                Typeset.Left(g, label.Lines[i], font, Palette.Ink, label.Left, top + rowTops[label.Row] + i * lineHeight);
    }
}
