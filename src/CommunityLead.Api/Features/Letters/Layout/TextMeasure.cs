using System.Collections.Concurrent;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>Measures and wraps text with PDFsharp's own metrics, so what is measured is what is drawn.</summary>
internal sealed class TextMeasure(XGraphics measure)
{
    // A mailing measures the same phrases in the same fonts thousands of times (twice a letter when the tight spacing
    // is tried): widths are remembered for the process, keyed by what decides them. Bounded, since names and
    // addresses differ from letter to letter; past the bound a width is simply measured again.
    private const int RememberedWidths = 100_000;
    private static readonly ConcurrentDictionary<(string Text, double Size, XFontStyleEx Style), double> Widths =
        new(concurrencyLevel: 4 * Environment.ProcessorCount, capacity: 8_192);

    public double Width(string text, XFont font)
    {
        if (text.Length == 0) return 0;
        var key = (text, font.Size, font.Style);
        if (Widths.TryGetValue(key, out var width)) return width;
        width = measure.MeasureString(text, font).Width;
        if (Widths.Count < RememberedWidths) Widths.TryAdd(key, width);
        return width;
    }

    /// <summary>
    /// Greedy word wrap at spaces. A number stays on the line of the word after it ("10 µg/L") while the two fit
    /// on one line. Line breaks in the text are kept; a word wider than the whole line is cut between characters
    /// rather than drawn past the margin.
    /// </summary>
    public List<string> Wrap(string text, XFont font, double width)
    {
        var lines = new List<string>();
        var space = Width(" ", font);
        foreach (var hardLine in text.Replace("\r\n", "\n").Split('\n'))
        {
            var line = "";
            var lineWidth = 0.0;
            foreach (var unit in Units(hardLine))
            {
                IEnumerable<string> pieces = Width(unit, font) <= width
                    ? [unit]
                    : unit.Split(' ').SelectMany(word => FitWord(word, font, width));
                foreach (var piece in pieces)
                {
                    var pieceWidth = Width(piece, font);
                    if (line.Length > 0 && lineWidth + space + pieceWidth <= width)
                    {
                        line += " " + piece;
                        lineWidth += space + pieceWidth;
                        continue;
                    }
                    if (line.Length > 0)
                        lines.Add(line);
                    (line, lineWidth) = (piece, pieceWidth);
                }
            }
            lines.Add(line);
        }
        return lines;
    }

    /// <summary>The text's words, with each number joined to the word after it.</summary>
    public static List<string> Units(string text)
    {
        var units = new List<string>();
        var glue = false;
        foreach (var word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            if (glue)
                units[^1] += " " + word;
            else
                units.Add(word);
            glue = word.Any(char.IsAsciiDigit) && word.All(c => char.IsAsciiDigit(c) || c is '.' or ',');
        }
        return units;
    }

    private IEnumerable<string> FitWord(string word, XFont font, double width)
    {
        while (word.Length > 1 && Width(word, font) > width)
        {
            var take = word.Length - 1;
            while (take > 1 && Width(word[..take], font) > width)
                take--;
            yield return word[..take];
            word = word[take..];
        }
        yield return word;
    }
}
