namespace CommunityLead.Rules.Reports;

/// <summary>
/// Picks complements for one given-away entry (r, c): the cheapest path from row r to column c that avoids (r, c)
/// closes a cycle through it. Already hidden entries cost nothing, so the path runs through lines that already have
/// suppression where it can; a shown count costs its value, so the smallest counts go first; a total costs more than
/// every count together, so totals are hidden only when no path through counts exists (a row or column whose only
/// non-zero count is the small one, or a one-row or one-column table).
/// </summary>
internal static class ComplementPath
{
    public static IEnumerable<(int Row, int Column)> Cheapest(SuppressionGrid grid, int row, int column)
    {
        var totalPenalty = grid[grid.Rows, grid.Columns] + 1;
        var cost = Enumerable.Repeat(long.MaxValue, grid.Vertices).ToArray();
        var via = new (int From, int Row, int Column)[grid.Vertices];
        var done = new bool[grid.Vertices];
        cost[row] = 0;
        // Plain O(V²) Dijkstra: a report table has a few dozen lines, and ties go to the lowest vertex, so the
        // same table always gets the same complements.
        for (var v = Next(cost, done); v >= 0; v = Next(cost, done))
        {
            done[v] = true;
            foreach (var (w, i, j) in grid.Neighbours(v))
            {
                if ((i, j) == (row, column) || done[w]) continue;
                var step = grid.Hidden[i, j] ? 0 : grid[i, j] + (grid.IsTotal(i, j) ? totalPenalty : 0);
                if (cost[v] + step < cost[w])
                {
                    cost[w] = cost[v] + step;
                    via[w] = (v, i, j);
                }
            }
        }
        // Every hidden entry is at least 1, so its row, column and the grand total are too: a path always exists.
        if (cost[grid.ColumnVertex(column)] == long.MaxValue)
            throw new InvalidOperationException($"No complement closes a cycle through entry ({row}, {column}).");
        var path = new List<(int, int)>();
        for (var v = grid.ColumnVertex(column); v != row; v = via[v].From)
            if (!grid.Hidden[via[v].Row, via[v].Column]) path.Add((via[v].Row, via[v].Column));
        return path;
    }

    private static int Next(long[] cost, bool[] done)
    {
        var best = -1;
        for (var v = 0; v < cost.Length; v++)
            if (!done[v] && cost[v] != long.MaxValue && (best < 0 || cost[v] < cost[best])) best = v;
        return best;
    }
}
