using PdfSharp.Pdf;
using PdfSharp.Pdf.IO;

namespace CommunityLead.Api.Features.Letters;

/// <summary>Small operations on finished PDFs: counting pages, and joining a mailing into one file for printing.</summary>
public static class LetterPdf
{
    public static int PageCount(byte[] pdf)
    {
        using var document = PdfReader.Open(new MemoryStream(pdf), PdfDocumentOpenMode.Import);
        return document.PageCount;
    }

    /// <summary>
    /// One PDF with every letter in order. Each letter starts on an odd page, so double-sided printing never
    /// puts two households on one sheet.
    /// </summary>
    public static byte[] Combine(IEnumerable<byte[]> letters)
    {
        using var combined = new PdfDocument();
        foreach (var letter in letters)
        {
            using var source = PdfReader.Open(new MemoryStream(letter), PdfDocumentOpenMode.Import);
            foreach (var page in source.Pages) combined.AddPage(page);
            if (source.PageCount % 2 == 1)
            {
                var blank = combined.AddPage();
                blank.Width = source.Pages[0].Width;
                blank.Height = source.Pages[0].Height;
            }
        }
        using var output = new MemoryStream();
        combined.Save(output);
        return output.ToArray();
    }
}
