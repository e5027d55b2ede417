namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Deals the body's blocks onto pages top-down. A block that doesn't fit opens a new page, and so does a block
/// that must keep with the next ones when they wouldn't fit together, unless the group is taller than a page.
/// A table row that opens a page gets the table's header row above it again. Nothing is dropped: content too
/// long for two pages simply gets a third.
/// </summary>
internal static class Paginator
{
    public static List<List<(Block Block, double Top)>> Paginate(IReadOnlyList<Block> blocks, double firstTop, double laterTop, double bottom)
    {
        var pages = new List<List<(Block, double)>> { new() };
        var y = firstTop;
        for (var i = 0; i < blocks.Count; i++)
        {
            var block = blocks[i];
            var opensPage = pages[^1].Count == 0;
            var space = opensPage ? 0 : block.SpaceBefore;
            var repeated = block.RepeatAbove?.Height ?? 0;
            var group = GroupHeight(blocks, i);
            var needed = repeated + group <= bottom - laterTop ? group : block.Height;
            if (!opensPage && y + space + needed > bottom)
            {
                pages.Add([]);
                (y, space, opensPage) = (laterTop, 0, true);
            }
            if (opensPage && pages.Count > 1 && block.RepeatAbove is { } above)
            {
                pages[^1].Add((above, y));
                y += above.Height;
            }
            pages[^1].Add((block, y + space));
            y += space + block.Height;
        }
        return pages;
    }

    /// <summary>Height of the block and those it must stay with, as if set one after the other.</summary>
    private static double GroupHeight(IReadOnlyList<Block> blocks, int start)
    {
        var height = blocks[start].Height;
        for (var i = start; blocks[i].KeepWithNext && i + 1 < blocks.Count; i++)
            height += blocks[i + 1].SpaceBefore + blocks[i + 1].Height;
        return height;
    }
}
