using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// A paragraph as one block per line, so it can continue on the next page; its first two and last two lines
/// stay together (no orphan or widow line alone at a page's foot or head).
/// </summary>
internal static class ParagraphBlocks
{
    /// <param name="label">Drawn in the hanging indent of the first line, e.g. "2." for a numbered step.</param>
    public static IEnumerable<Block> Lines(
        TextMeasure measure, string text, XFont font, XBrush brush, double x, double width,
        double spaceBefore, string? label = null, double indent = 0)
    {
        var lines = measure.Wrap(text, font, width - indent);
        var height = Typeset.LineHeight(font);
        for (var i = 0; i < lines.Count; i++)
        {
            var line = lines[i];
            var first = i == 0;
            yield return new Block(height, (g, top) =>
            {
                if (first && label is not null)
                    Typeset.Left(g, label, font, brush, x, top);
                Typeset.Left(g, line, font, brush, x + indent, top);
            })
            {
                SpaceBefore = first ? spaceBefore : 0,
                KeepWithNext = (first && lines.Count > 1) || (i == lines.Count - 2 && lines.Count > 2),
            };
        }
    }
}
