using System.Globalization;
using CommunityLead.Api.Features.Letters.Layout;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.LabResults;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>Every QC figure of the verdict, one row each: what, the value, its window, the verdict and the service's words.</summary>
internal static class FigureTable
{
    private static readonly (string Title, double Width)[] Columns =
        [("Analyte", 44), ("Check", 118), ("Value", 52), ("Window", 64), ("Verdict", 40), ("Detail", 197)];

    /// <summary>Draws rows from <paramref name="first"/> until the page is full; returns the next row to draw.</summary>
    public static int Draw(XGraphics gfx, XRect area, IReadOnlyList<QcCheck> checks, int first)
    {
        var fonts = LetterFonts.Shared;
        var y = area.Top;
        Row(gfx, area.Left, ref y, [.. Columns.Select(c => c.Title)], fonts.SmallItalic, XBrushes.Black, header: true);
        var i = first;
        for (; i < checks.Count; i++)
        {
            var c = checks[i];
            // r is judged in its fourth decimal; five significant figures would print 0.99999 as 1.
            var value = c.Figure == "correlation r" && c.Value is { } r ? r.ToString("0.000000", CultureInfo.InvariantCulture) : Number(c.Value);
            string[] cells = [c.Analyte == Analyte.Lead ? "lead" : "copper", Figure(c), value, WindowText(c.Low, c.High),
                c.Passed ? "pass" : "FAIL", c.Detail];
            if (y + Height(gfx, cells, fonts.Tiny) > area.Bottom) break;
            Row(gfx, area.Left, ref y, cells, fonts.Tiny, c.Passed ? XBrushes.Black : new XSolidBrush(Marks.FailColour), header: false);
        }
        return i;
    }

    private static void Row(XGraphics gfx, double x, ref double y, string[] cells, XFont font, XBrush brush, bool header)
    {
        var height = Height(gfx, cells, font);
        for (var c = 0; c < cells.Length; c++)
        {
            var lines = Wrap(gfx, cells[c], font, Columns[c].Width - 4);
            for (var l = 0; l < lines.Count; l++)
                gfx.DrawString(lines[l], font, brush, new XPoint(x + 1, y + 8 + l * 8.6));
            x += Columns[c].Width;
        }
        y += height;
        var pen = new XPen(header ? XColors.Black : XColors.LightGray, header ? 0.6 : 0.3);
        gfx.DrawLine(pen, x - Columns.Sum(c => c.Width), y - 1, x, y - 1);
    }

    private static double Height(XGraphics gfx, string[] cells, XFont font) =>
        cells.Select((t, c) => Wrap(gfx, t, font, Columns[c].Width - 4).Count).Max() * 8.6 + 3;

    /// <summary>Greedy word wrap by the font's own measure.</summary>
    private static List<string> Wrap(XGraphics gfx, string text, XFont font, double width)
    {
        var lines = new List<string>();
        var line = "";
        foreach (var word in text.Split(' '))
        {
            var candidate = line.Length == 0 ? word : $"{line} {word}";
            if (line.Length > 0 && gfx.MeasureString(candidate, font).Width > width)
            {
                lines.Add(line);
                line = word;
            }
            else line = candidate;
        }
        lines.Add(line);
        return lines;
    }

    private static string Figure(QcCheck c) => c.Type is { } type ? $"{KebabEnum.Name(type)}: {c.Figure}" : c.Figure;

    private static string Number(double? v) => v switch
    {
        null => "—",
        { } x when Math.Abs(x) >= 10_000 => x.ToString("#,0", CultureInfo.InvariantCulture),
        { } x => x.ToString("G5", CultureInfo.InvariantCulture),
    };

    private static string WindowText(double? low, double? high) => (low, high) switch
    {
        (null, null) => "—",
        (null, { } h) => $"≤ {Number(h)}",
        ({ } l, null) => $"≥ {Number(l)}",
        ({ } l, { } h) => $"{Number(l)} – {Number(h)}",
    };
}
