using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The top of the first page: the program's name and address on the left, above the envelope window; its
/// contact lines and the date on the right, beside the window; the recipient inside the window.
/// </summary>
internal sealed class LetterHeader
{
    private const double ColumnGap = 12;
    private readonly List<Action<XGraphics>> draws = [];

    /// <summary>Lowest point used on the page; the body starts below it.</summary>
    public double Bottom { get; private set; }

    public static LetterHeader Plan(LetterContent content, PageGeometry page, LetterFonts fonts, TextMeasure measure)
    {
        var header = new LetterHeader();
        var left = new TextColumn(header.draws, measure, page.Left, page.Window.Right - page.Left, page.Top, alignRight: false);
        var right = new TextColumn(header.draws, measure, page.Window.Right + ColumnGap, page.Right - page.Window.Right - ColumnGap,
            page.Top, alignRight: true);

        left.Add(content.Program.Name, fonts.ProgramName, Palette.Accent);
        left.Gap(2);
        // The address goes under the name while it stays above the window; a long one moves to the right column.
        var addressHeight = content.Program.AddressLines.Sum(line => left.HeightOf(line, fonts.Small));
        var addressColumn = left.Y + addressHeight <= page.Window.Top - 4 ? left : right;
        foreach (var line in content.Program.AddressLines)
            addressColumn.Add(line, fonts.Small, Palette.Muted);
        if (addressColumn == right)
            right.Gap(4);
        foreach (var line in content.Program.ContactLines)
            right.Add(line, fonts.Small, Palette.Muted);

        // Drawn before the date on its line, so text pulled from the PDF (screen readers, copy and paste) reads
        // the name and then the date, not the two run together.
        header.draws.Add(RecipientBlock.Plan(content.Recipient, page, fonts, measure).Draw);

        // The date lines up with the recipient's name, unless the contact lines reach further down.
        right.MoveTo(Math.Max(right.Y + 10, page.Window.Top + page.WindowInset));
        right.Add(content.Date, fonts.Body, Palette.Ink);
        header.Bottom = Math.Max(Math.Max(left.Y, right.Y), page.Window.Bottom);
        return header;
    }

    public void Draw(XGraphics g)
    {
        foreach (var draw in draws)
            draw(g);
    }
}
