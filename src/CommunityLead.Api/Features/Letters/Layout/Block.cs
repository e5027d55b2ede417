using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// One piece of the letter's body that is never split across pages: a line of text, a table row, a scale.
/// Blocks are measured first and drawn later, once the paginator knows which page and height each one gets.
/// </summary>
/// <param name="Draw">Draws the block with its top edge at the given height on the page.</param>
internal sealed record Block(double Height, Action<XGraphics, double> Draw)
{
    /// <summary>Room above the block, dropped when the block opens a page.</summary>
    public double SpaceBefore { get; init; }

    /// <summary>Must share a page with the next block: headings, and the lines that prevent widows and orphans.</summary>
    public bool KeepWithNext { get; init; }

    /// <summary>Drawn above this block when it opens a page: a table's header row above a row that continues it.</summary>
    public Block? RepeatAbove { get; init; }
}
