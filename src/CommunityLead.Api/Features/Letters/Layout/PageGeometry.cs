using PdfSharp;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Where things go on one paper size, in points (1/72 in), measured from the top-left corner as XGraphics draws.
/// </summary>
/// <param name="Window">The envelope window, where the recipient's address must show.</param>
/// <param name="WindowInset">How far the address stays inside the window's edges: a folded letter shifts in its envelope.</param>
internal sealed record PageGeometry(PageSize Size, double Width, double Height, double Margin, XRect Window, double WindowInset)
{
    private const double Inch = 72;
    private const double Mm = Inch / 25.4;

    // US Letter, folded in three for a #10 window envelope. Window 4.5 × 1.125 in, its left edge 7/8 in from the
    // sheet's left and its top 2 in from the sheet's top (common practice for #10 window envelopes; from memory,
    // check against the envelopes actually bought).
    public static readonly PageGeometry Letter = new(
        PageSize.Letter, 612, 792, 20 * Mm,
        new XRect(0.875 * Inch, 2 * Inch, 4.5 * Inch, 1.125 * Inch), 0.15 * Inch);

    // A4 for a DL or C5/6 window envelope: window 90 × 45 mm, 20 mm from the left and 45 mm from the top, the
    // DIN 5008 form B address field (from memory). The address itself starts lower, about 50 mm down, inside it.
    public static readonly PageGeometry A4 = new(
        PageSize.A4, 595, 842, 20 * Mm,
        new XRect(20 * Mm, 45 * Mm, 90 * Mm, 45 * Mm), 5 * Mm);

    public static PageGeometry For(PaperSize paper) => paper == PaperSize.A4 ? A4 : Letter;

    public double Left => Margin;
    public double Right => Width - Margin;
    public double ContentWidth => Width - 2 * Margin;
    public double Top => Margin;
    public double Bottom => Height - Margin;
}
