using UglyToad.PdfPig.Content;
using UglyToad.PdfPig.Core;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>What must never happen on a printed page: words on top of each other, or a line or shape drawn through a word.</summary>
public static class PageChecks
{
    /// <summary>Boxes may touch; they overlap when they share more than this much, in points, each way.</summary>
    const double Slack = 0.25;

    // Liberation Sans ascent and descent, in em (the font's hhea metrics, from memory; Arial's are the same). The box
    // from descent to ascent holds every glyph, accents and descenders included.
    const double Ascent = 0.905;
    const double Descent = 0.212;

    /// <summary>
    /// Where a word's ink can be: from its baseline down by the font's descent and up by its ascent. PdfPig's own
    /// glyph boxes come out shifted by the glyph's height on PDFsharp's flipped text, so they are not used here.
    /// </summary>
    public static PdfRectangle InkBox(Word word)
    {
        var (first, last) = (word.Letters[0], word.Letters[^1]);
        var (baseline, size) = (first.StartBaseLine.Y, first.PointSize);
        return new PdfRectangle(first.StartBaseLine.X, baseline - Descent * size, last.EndBaseLine.X, baseline + Ascent * size);
    }

    public static IEnumerable<string> OverlappingWords(RenderedLetter letter, int page)
    {
        var words = letter.PageWords[page];
        for (var i = 0; i < words.Count; i++)
            for (var j = i + 1; j < words.Count; j++)
                if (Overlap(InkBox(words[i]), InkBox(words[j])))
                    yield return $"page {page + 1}: '{words[i].Text}' {Box(words[i])} overlaps '{words[j].Text}' {Box(words[j])}";
    }

    public static IEnumerable<string> WordsCrossingDrawings(RenderedLetter letter, int page)
    {
        foreach (var word in letter.PageWords[page])
        {
            var box = Shrunk(InkBox(word));
            foreach (var line in letter.PageLines[page].Where(line => Crosses(line, box)))
                yield return $"page {page + 1}: a line ({line.From.X:F1}, {line.From.Y:F1})–({line.To.X:F1}, {line.To.Y:F1}) crosses '{word.Text}' {Box(word)}";
            foreach (var fill in letter.PageFills[page].Where(fill => Overlap(fill, InkBox(word))))
                yield return $"page {page + 1}: a shape ({fill.Left:F1}, {fill.Bottom:F1})–({fill.Right:F1}, {fill.Top:F1}) covers '{word.Text}' {Box(word)}";
        }
    }

    static bool Overlap(PdfRectangle a, PdfRectangle b) =>
        Math.Min(a.Right, b.Right) - Math.Max(a.Left, b.Left) > Slack && Math.Min(a.Top, b.Top) - Math.Max(a.Bottom, b.Bottom) > Slack;

    static PdfRectangle Shrunk(PdfRectangle r) => new(r.Left + Slack, r.Bottom + Slack, r.Right - Slack, r.Top - Slack);

    /// <summary>Liang–Barsky: does any part of the segment lie inside the box?</summary>
    static bool Crosses(Segment line, PdfRectangle box)
    {
        var (x0, y0) = (line.From.X, line.From.Y);
        var (dx, dy) = (line.To.X - x0, line.To.Y - y0);
        double t0 = 0, t1 = 1;
        foreach (var (p, q) in new[] { (-dx, x0 - box.Left), (dx, box.Right - x0), (-dy, y0 - box.Bottom), (dy, box.Top - y0) })
        {
            if (p == 0)
            {
                if (q < 0) return false;
                continue;
            }
            var t = q / p;
            if (p < 0) t0 = Math.Max(t0, t);
            else t1 = Math.Min(t1, t);
            if (t0 > t1) return false;
        }
        return true;
    }

    static string Box(Word w) => InkBox(w) is var b ? $"({b.Left:F1}, {b.Bottom:F1})–({b.Right:F1}, {b.Top:F1})" : "";
}
