using CommunityLead.Api.Features.Letters.Layout;
using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace CommunityLead.Api.Features.Kits.Labels;

/// <summary>One label's words: the code, and the bottles that go in the kit in the household's language.</summary>
public sealed record KitLabel(string Code, string Bottles);

/// <summary>
/// Draws labels on sheets of a stock: per label a QR code on the left, and on the right the code as text, the
/// bottle names and a Code 128 barcode. Black on white only, as label printers and phone cameras like best.
/// </summary>
public static class LabelSheet
{
    private const double Padding = 5;

    public static byte[] Render(IReadOnlyList<KitLabel> labels, LabelStock stock)
    {
        using var document = new PdfDocument();
        document.Info.Title = "Kit labels";
        document.Info.Creator = "CommunityLead";
        var codeFont = LetterFonts.SizedBold(stock.LabelHeight < 80 ? 9.5 : 11);
        var bottleFont = LetterFonts.Sized(stock.LabelHeight < 80 ? 6 : 7);
        XGraphics? page = null;
        for (var i = 0; i < labels.Count; i++)
        {
            if (i % stock.PerSheet == 0)
            {
                page?.Dispose();
                var sheet = document.AddPage();
                sheet.Width = XUnit.FromPoint(stock.PageWidth);
                sheet.Height = XUnit.FromPoint(stock.PageHeight);
                page = XGraphics.FromPdfPage(sheet);
            }
            var (x, y) = stock.Corner(i);
            Draw(page!, labels[i], new XRect(x, y, stock.LabelWidth, stock.LabelHeight), codeFont, bottleFont);
        }
        page?.Dispose();
        using var stream = new MemoryStream();
        document.Save(stream);
        return stream.ToArray();
    }

    private static void Draw(XGraphics g, KitLabel label, XRect box, XFont codeFont, XFont bottleFont)
    {
        var qrSide = Math.Min(box.Height - 2 * Padding, box.Width * 0.4);
        DrawQr(g, label.Code, new XRect(box.X + Padding, box.Y + (box.Height - qrSide) / 2, qrSide, qrSide));

        var left = box.X + Padding + qrSide + 2;
        var width = box.Right - Padding - left;
        var codeTop = box.Y + Padding;
        g.DrawString(label.Code, codeFont, XBrushes.Black, new XRect(left, codeTop, width, codeFont.Height), XStringFormats.TopCenter);
        var bottlesTop = codeTop + codeFont.Height + 1;
        var fitted = Fit(g, label.Bottles, bottleFont, width);
        g.DrawString(label.Bottles, fitted, XBrushes.Black, new XRect(left, bottlesTop, width, bottleFont.Height), XStringFormats.TopCenter);
        var barTop = bottlesTop + bottleFont.Height + 3;
        DrawCode128(g, label.Code, new XRect(left, barTop, width, box.Bottom - Padding - barTop));
    }

    private static void DrawQr(XGraphics g, string code, XRect square)
    {
        var modules = Symbols.Qr(code);
        var count = modules.GetLength(0);
        var module = square.Width / (count + 2 * Symbols.QrQuietModules);
        var origin = square.X + Symbols.QrQuietModules * module;
        var top = square.Y + Symbols.QrQuietModules * module;
        for (var row = 0; row < count; row++)
            for (var column = 0; column < count; column++)
                if (modules[row, column])
                    // A hair wider than a module, so neighbours join without hairline gaps in the rendering.
                    g.DrawRectangle(XBrushes.Black, origin + column * module, top + row * module, module * 1.02, module * 1.02);
    }

    private static void DrawCode128(XGraphics g, string code, XRect area)
    {
        var bars = Symbols.Code128(code);
        var module = area.Width / (bars.Length + 2 * Symbols.BarQuietModules);
        var x = area.X + Symbols.BarQuietModules * module;
        // Runs of dark modules as one bar each: fewer shapes, and no seams inside a wide bar.
        for (var i = 0; i < bars.Length;)
        {
            if (!bars[i]) { i++; continue; }
            var start = i;
            while (i < bars.Length && bars[i]) i++;
            g.DrawRectangle(XBrushes.Black, x + start * module, area.Y, (i - start) * module, area.Height);
        }
    }

    /// <summary>
    /// The bottle line's font, smaller when the words are wider than the label (Spanish runs longer), never below
    /// 5 pt; the lines are short enough that 5 pt always fits the smallest stock.
    /// </summary>
    private static XFont Fit(XGraphics g, string text, XFont font, double width)
    {
        var measured = g.MeasureString(text, font).Width;
        return measured <= width ? font : LetterFonts.Sized(Math.Max(5, Math.Floor(font.Size * width / measured * 10) / 10));
    }
}
