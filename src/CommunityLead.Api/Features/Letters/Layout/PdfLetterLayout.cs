using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Lays a letter out as PDF with PDFsharp: the body is measured into blocks, dealt onto pages, then drawn, with
/// the first page's header and every page's footer around it. A body that spills onto another page is dealt again with
/// tighter spacing, and kept that way if it then needs fewer pages. Thread-safe; fonts are made once per process.
/// </summary>
public sealed class PdfLetterLayout : ILetterLayout
{
    private const double FooterGap = 10;

    public string ContentType => "application/pdf";

    public byte[] Render(LetterContent content) => Render(content, out _);

    public byte[] Render(LetterContent content, out int pageCount)
    {
        var fonts = LetterFonts.Shared;
        var page = PageGeometry.For(content.Paper);
        using var measureContext = XGraphics.CreateMeasureContext(
            new XSize(page.Width, page.Height), XGraphicsUnit.Point, XPageDirection.Downwards);
        var measure = new TextMeasure(measureContext);

        var header = LetterHeader.Plan(content, page, fonts, measure);
        var footer = LetterFooter.Plan(content, page, fonts, measure);
        var pages = Paginate(BodySpacing.Regular);
        if (pages.Count > 1 && Paginate(BodySpacing.Tight) is var tight && tight.Count < pages.Count)
            pages = tight;

        using var document = new PdfDocument();
        // Saved plain: CompactPdf then trims the fonts (they were 50 of a letter's 65 KB) and compresses every stream,
        // page contents included, so PDFsharp's own compression settings would have nothing to do.
        document.Options.NoCompression = true;
        for (var p = 0; p < pages.Count; p++)
        {
            var pdfPage = document.AddPage();
            pdfPage.Size = page.Size;
            using var g = XGraphics.FromPdfPage(pdfPage);
            if (p == 0)
                header.Draw(g);
            foreach (var (block, top) in pages[p])
                block.Draw(g, top);
            footer.Draw(g, p + 1, pages.Count);
        }
        pageCount = pages.Count;
        return ReproduciblePdf.Save(document, content);

        List<List<(Block Block, double Top)>> Paginate(BodySpacing spacing) => Paginator.Paginate(
            LetterBody.Build(content, page, fonts, measure, spacing), header.Bottom + spacing.AfterHeader, page.Top, footer.Top - FooterGap);
    }
}
