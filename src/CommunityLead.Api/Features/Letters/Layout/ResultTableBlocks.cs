using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The results table: bold headers between two dark rules, one block per row (a row is never split across
/// pages; the headers repeat above a row that opens a page), thin rules between rows, and the note under it in
/// smaller italic.
/// </summary>
internal static class ResultTableBlocks
{
    private const double PadX = 4;
    private const double PadY = 3.5;

    public static IEnumerable<Block> Build(
        TextMeasure measure, LetterFonts fonts, ResultTable table, double x, double width, double spaceBefore)
    {
        var columns = Math.Max(table.Headers.Count, table.Rows.Select(row => row.Count).DefaultIfEmpty(0).Max());
        if (columns == 0)
            yield break;
        var widths = TableColumns.Widths(measure, fonts, table, columns, width, PadX);

        var header = Row(measure, table.Headers, fonts.BodyBold, x, widths, isHeader: true, isLast: table.Rows.Count == 0);
        yield return header with { SpaceBefore = spaceBefore, KeepWithNext = true };
        for (var i = 0; i < table.Rows.Count; i++)
        {
            var isLast = i == table.Rows.Count - 1;
            yield return Row(measure, table.Rows[i], fonts.Body, x, widths, isHeader: false, isLast)
                with { KeepWithNext = isLast && !string.IsNullOrWhiteSpace(table.Note), RepeatAbove = header };
        }
        if (!string.IsNullOrWhiteSpace(table.Note))
            foreach (var line in ParagraphBlocks.Lines(measure, table.Note, fonts.SmallItalic, Palette.Muted, x, width, 3))
                yield return line;
    }

    private static Block Row(TextMeasure measure, IReadOnlyList<string> cells, XFont font, double x, double[] widths, bool isHeader, bool isLast)
    {
        var wrapped = widths.Select((w, c) => measure.Wrap(c < cells.Count ? cells[c] : "", font, w - 2 * PadX)).ToArray();
        var lineHeight = Typeset.LineHeight(font);
        var height = wrapped.Max(lines => lines.Count) * lineHeight + 2 * PadY;
        var right = x + widths.Sum();
        return new Block(height, (g, top) =>
        {
            if (isHeader)
                g.DrawLine(Palette.HeaderRule, x, top, right, top);
            var left = x;
            for (var c = 0; c < widths.Length; c++)
            {
                for (var l = 0; l < wrapped[c].Count; l++)
                    Typeset.Left(g, wrapped[c][l], font, Palette.Ink, left + PadX, top + PadY + l * lineHeight);
                left += widths[c];
            }
            g.DrawLine(isHeader || isLast ? Palette.HeaderRule : Palette.Rule, x, top + height, right, top + height);
        });
    }
}
