using UglyToad.PdfPig;
using UglyToad.PdfPig.DocumentLayoutAnalysis.TextExtractor;

namespace CommunityLead.Tests.Features.Letters;

/// <summary>Reads a letter back the way a person would see it: its text, page by page.</summary>
public sealed record LetterPdfText(int Pages, string Text)
{
    public static LetterPdfText Read(byte[] pdf)
    {
        using var document = PdfDocument.Open(pdf);
        var pages = document.GetPages().Select(p => ContentOrderTextExtractor.GetText(p)).ToList();
        return new LetterPdfText(pages.Count, string.Join("\n", pages));
    }

    /// <summary>Text with line breaks and repeated spaces folded, so wrapped phrases can be found.</summary>
    public string Flat => string.Join(' ', Text.Split((char[])[' ', '\n', '\r', '\t'], StringSplitOptions.RemoveEmptyEntries));
}
