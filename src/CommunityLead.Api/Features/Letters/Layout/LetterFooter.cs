using CommunityLead.Rules.Households;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>The footer text in small print at the foot of every page, above the bottom margin, with "page N of M".</summary>
internal sealed class LetterFooter(List<string> lines, PageGeometry page, XFont font, LetterLanguage language)
{
    private const double RuleGap = 4;
    private const double LabelGap = 16;

    /// <summary>Where the footer's rule is drawn; the body ends above it.</summary>
    public double Top { get; } = page.Bottom - RuleGap - lines.Count * Typeset.LineHeight(font);

    public static LetterFooter Plan(LetterContent content, PageGeometry page, LetterFonts fonts, TextMeasure measure)
    {
        // Room for the widest label a letter could need, so the footer text never runs under it.
        var labelWidth = measure.Width(PageLabel(content.Language, 88, 88), fonts.Tiny);
        var lines = measure.Wrap(content.Footer, fonts.Tiny, page.ContentWidth - labelWidth - LabelGap);
        return new LetterFooter(lines, page, fonts.Tiny, content.Language);
    }

    public void Draw(XGraphics g, int pageNumber, int pageCount)
    {
        g.DrawLine(Palette.Rule, page.Left, Top, page.Right, Top);
        var lineHeight = Typeset.LineHeight(font);
        for (var i = 0; i < lines.Count; i++)
            Typeset.Left(g, lines[i], font, Palette.Muted, page.Left, Top + RuleGap + i * lineHeight);
        Typeset.Right(g, PageLabel(language, pageNumber, pageCount), font, Palette.Muted, page.Right, Top + RuleGap);
    }

    // The one phrase the layout words itself: LetterContent has no field for it (reported to the composer's owner).
    private static string PageLabel(LetterLanguage language, int page, int count) => language switch
    {
        LetterLanguage.Es => $"Página {page} de {count}",
        _ => $"Page {page} of {count}",
    };
}
