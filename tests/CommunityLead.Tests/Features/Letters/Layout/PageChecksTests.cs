using CommunityLead.Api.Features.Letters.Layout;
using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>The page checks find what they look for, so a clean letter means something.</summary>
public class PageChecksTests
{
    static RenderedLetter Draw(Action<XGraphics, XFont> draw)
    {
        var font = LetterFonts.Shared.Body;
        using var document = new PdfDocument();
        using (var g = XGraphics.FromPdfPage(document.AddPage()))
            draw(g, font);
        using var stream = new MemoryStream();
        document.Save(stream);
        return RenderedLetter.Read(stream.ToArray());
    }

    [Fact]
    public void Checks_TickThroughTheDescenderOfAWord_IsFound()
    {
        // The old defect: a tick whose top reaches 1 pt into the "g" of "mg/kg", below the baseline.
        var letter = Draw((g, font) =>
        {
            g.DrawString("940 mg/kg", font, XBrushes.Black, 100, 100);
            var end = 100 + g.MeasureString("940 mg/kg", font).Width - 1;
            g.DrawLine(new XPen(XColors.Black, 1), end, 101, end, 120);
        });

        Assert.Single(PageChecks.WordsCrossingDrawings(letter, 0));
    }

    [Fact]
    public void Checks_WordsOnTopOfEachOtherAndAShapeOverAWord_AreFound()
    {
        var letter = Draw((g, font) =>
        {
            g.DrawString("Action level 10", font, XBrushes.Black, 100, 100);
            g.DrawString("Urgent", font, XBrushes.Black, 140, 102);
            g.DrawRectangle(XBrushes.Gray, 300, 95, 10, 10);
            g.DrawString("covered", font, XBrushes.Black, 295, 100);
        });

        Assert.NotEmpty(PageChecks.OverlappingWords(letter, 0));
        Assert.Contains(PageChecks.WordsCrossingDrawings(letter, 0), problem => problem.Contains("covered"));
    }

    [Fact]
    public void Checks_WordsApartAndATickBelowThem_NothingFound()
    {
        var letter = Draw((g, font) =>
        {
            g.DrawString("940 mg/kg", font, XBrushes.Black, 100, 100);
            g.DrawString("Action level 10", font, XBrushes.Black, 100, 114);
            g.DrawLine(new XPen(XColors.Black, 1), 150, 118, 150, 140);
        });

        Assert.Empty(PageChecks.OverlappingWords(letter, 0));
        Assert.Empty(PageChecks.WordsCrossingDrawings(letter, 0));
    }
}
