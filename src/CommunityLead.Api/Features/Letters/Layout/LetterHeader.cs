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
            AddContact(right, left, line, page, fonts, measure);

        // Drawn before the date on its line, so text pulled from the PDF (screen readers, copy and paste) reads
        // the name and then the date, not the two run together.
        header.draws.Add(RecipientBlock.Plan(content.Recipient, page, fonts, measure).Draw);

        // The date lines up with the recipient's name, unless the contact lines reach further down.
        right.MoveTo(Math.Max(right.Y + 10, page.Window.Top + page.WindowInset));
        right.Add(content.Date, fonts.Body, Palette.Ink);
        header.Bottom = Math.Max(Math.Max(left.Y, right.Y), page.Window.Bottom);
        return header;
    }

    /// <summary>
    /// A contact line, right-aligned, using the room beside the left column's lines where they are short. A line that
    /// still doesn't fit breaks after its label ("Correo electrónico:"), so a label is never split and an address is
    /// cut only if it is wider than all the room there is.
    /// </summary>
    private static void AddContact(TextColumn right, TextColumn left, string line, PageGeometry page, LetterFonts fonts, TextMeasure measure)
    {
        double Room()
        {
            var (top, bottom) = (right.Y, right.Y + Typeset.LineHeight(fonts.Small));
            // Beside the window the recipient's address is there, whatever the left column holds.
            if (bottom > page.Window.Top)
                return page.Right - (page.Window.Right + ColumnGap);
            var start = left.Extents.Where(e => e.Top < bottom && e.Bottom > top).Select(e => e.Right + ColumnGap).DefaultIfEmpty(page.Left).Max();
            return page.Right - Math.Min(start, page.Window.Right + ColumnGap);
        }

        if (measure.Width(line, fonts.Small) <= Room())
        {
            right.AddLine(line, fonts.Small, Palette.Muted);
            return;
        }
        var colon = line.IndexOf(": ", StringComparison.Ordinal);
        var parts = colon > 0 ? [line[..(colon + 1)], line[(colon + 2)..]] : new[] { line };
        foreach (var part in parts)
            foreach (var piece in measure.Wrap(part, fonts.Small, Room()))
                right.AddLine(piece, fonts.Small, Palette.Muted);
    }

    public void Draw(XGraphics g)
    {
        foreach (var draw in draws)
            draw(g);
    }
}
