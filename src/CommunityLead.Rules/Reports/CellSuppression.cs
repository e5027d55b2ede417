namespace CommunityLead.Rules.Reports;

/// <summary>
/// Small-cell suppression for a table of counts whose row and column totals are published. Primary: every count from
/// 1 to the threshold is hidden; zero may show [published: CMS cell size suppression policy]. Complementary: more
/// entries are hidden until no hidden count can be worked out from the totals or the shown counts (or from percentages
/// of the totals, which carry the same information). The rule used is stronger than "two hidden cells in every line":
/// every hidden entry must lie on a cycle of hidden entries (see <see cref="SuppressionGrid"/>), because two hidden
/// blocks joined by a single hidden cell pass the two-per-line rule and still give that cell away.
/// </summary>
public static class CellSuppression
{
    /// <summary>Counts 1–10 are not shown [published: CMS cell size suppression policy]. CDC WONDER hides 9 or fewer.</summary>
    public const int DefaultThreshold = 10;

    public static SuppressedTable Suppress(int[][] counts, int threshold)
    {
        var columns = Validate(counts, threshold);
        var grid = new SuppressionGrid(counts, columns);
        var primary = 0;
        for (var i = 0; i < grid.Rows; i++)
        for (var j = 0; j < columns; j++)
            if (counts[i][j] >= 1 && counts[i][j] <= threshold)
            {
                grid.Hidden[i, j] = true;
                primary++;
            }

        // Each round puts one given-away entry on a cycle, with the entries added for it; more hidden entries never
        // break a cycle, so one pass over the grid leaves it stable.
        (int Row, int Column) from = (0, 0);
        while (grid.NextBridge(from.Row, from.Column) is { } bridge)
        {
            foreach (var (i, j) in ComplementPath.Cheapest(grid, bridge.Row, bridge.Column))
                grid.Hidden[i, j] = true;
            from = bridge;
        }

        return Result(grid, primary, threshold);
    }

    private static SuppressedTable Result(SuppressionGrid grid, int primary, int threshold)
    {
        int rows = grid.Rows, columns = grid.Columns;
        var cells = Enumerable.Range(0, rows).Select(i => Enumerable.Range(0, columns).Select(j => grid.Hidden[i, j]).ToArray()).ToArray();
        var complements = cells.Sum(r => r.Count(h => h)) - primary;
        var totals = Enumerable.Range(0, rows).Count(i => grid.Hidden[i, columns]) +
            Enumerable.Range(0, columns).Count(j => grid.Hidden[rows, j]) + (grid.Hidden[rows, columns] ? 1 : 0);
        return new SuppressedTable(cells, Reason(primary, complements, totals, threshold))
        {
            RowTotalsSuppressed = [.. Enumerable.Range(0, rows).Select(i => grid.Hidden[i, columns])],
            ColumnTotalsSuppressed = [.. Enumerable.Range(0, columns).Select(j => grid.Hidden[rows, j])],
            GrandTotalSuppressed = grid.Hidden[rows, columns],
        };
    }

    private static string Reason(int primary, int complements, int totals, int threshold)
    {
        var policy = threshold == 0 ? "No threshold set, so nothing is hidden."
            : $"Counts from 1 to {threshold} are hidden (cell size suppression policy).";
        if (primary == 0)
            return threshold == 0 ? policy : $"{policy} None here.";
        var also = new List<string>();
        if (complements > 0) also.Add(complements == 1 ? "1 more count" : $"{complements} more counts");
        if (totals > 0) also.Add(totals == 1 ? "1 total" : $"{totals} totals");
        return also.Count == 0 ? policy
            : $"{policy} {string.Join(" and ", also)} also hidden so the hidden counts cannot be worked out from the totals.";
    }

    private static int Validate(int[][] counts, int threshold)
    {
        ArgumentNullException.ThrowIfNull(counts);
        ArgumentOutOfRangeException.ThrowIfNegative(threshold);
        if (counts.Any(row => row is null))
            throw new ArgumentException("A row of the table is missing.", nameof(counts));
        var columns = counts.Length == 0 ? 0 : counts[0].Length;
        if (counts.Any(row => row.Length != columns))
            throw new ArgumentException("Every row of the table must have the same number of columns.", nameof(counts));
        if (counts.Any(row => row.Any(c => c < 0)))
            throw new ArgumentException("Counts cannot be negative.", nameof(counts));
        return columns;
    }
}
