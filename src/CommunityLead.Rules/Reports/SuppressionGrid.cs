namespace CommunityLead.Rules.Reports;

/// <summary>
/// A table with its totals as one (rows + 1) × (columns + 1) grid: the last column holds the row totals, the last row
/// the column totals, the corner the grand total. Every line of the grid adds up (cells to their total), so an attacker
/// who sees the shown entries holds one equation per line. Seen as a bipartite graph (lines are vertices, hidden entries
/// are edges), a hidden entry can be worked out exactly if and only if it lies on no cycle of hidden entries: along a
/// cycle, +1, −1, +1, … keeps every line's sum, and since every hidden entry is at least 1, both directions stay
/// non-negative. An entry on no cycle is a bridge, and the line sums pin it down.
/// </summary>
internal sealed class SuppressionGrid
{
    private readonly long[,] values;

    public SuppressionGrid(int[][] counts, int columns)
    {
        Rows = counts.Length;
        Columns = columns;
        values = new long[Rows + 1, Columns + 1];
        Hidden = new bool[Rows + 1, Columns + 1];
        for (var i = 0; i < Rows; i++)
        for (var j = 0; j < Columns; j++)
        {
            values[i, j] = counts[i][j];
            values[i, Columns] += counts[i][j];
            values[Rows, j] += counts[i][j];
            values[Rows, Columns] += counts[i][j];
        }
    }

    public int Rows { get; }
    public int Columns { get; }
    public bool[,] Hidden { get; }
    public long this[int i, int j] => values[i, j];
    public bool IsTotal(int i, int j) => i == Rows || j == Columns;

    /// <summary>
    /// The first hidden entry, row by row from (fromRow, fromColumn), that the totals would give away, if any. Hiding
    /// more never takes an entry off a cycle, so entries already found safe need not be looked at again.
    /// </summary>
    public (int Row, int Column)? NextBridge(int fromRow, int fromColumn)
    {
        for (var i = fromRow; i <= Rows; i++)
        for (var j = i == fromRow ? fromColumn : 0; j <= Columns; j++)
            if (Hidden[i, j] && !Connected(i, j))
                return (i, j);
        return null;
    }

    /// <summary>Whether row vertex i reaches column vertex j through hidden entries other than (i, j) itself.</summary>
    private bool Connected(int row, int column)
    {
        var seen = new bool[Vertices];
        var queue = new Queue<int>([row]);
        seen[row] = true;
        while (queue.TryDequeue(out var v))
            foreach (var (w, i, j) in Neighbours(v))
                if (Hidden[i, j] && (i, j) != (row, column) && !seen[w])
                {
                    if (w == ColumnVertex(column)) return true;
                    seen[w] = true;
                    queue.Enqueue(w);
                }
        return false;
    }

    internal int Vertices => Rows + Columns + 2;
    internal int ColumnVertex(int j) => Rows + 1 + j;

    /// <summary>Every non-zero entry on line v, as (the other line's vertex, row, column). Zeros stay shown.</summary>
    internal IEnumerable<(int Vertex, int Row, int Column)> Neighbours(int v)
    {
        if (v <= Rows)
        {
            for (var j = 0; j <= Columns; j++)
                if (values[v, j] > 0) yield return (ColumnVertex(j), v, j);
        }
        else
        {
            var j = v - Rows - 1;
            for (var i = 0; i <= Rows; i++)
                if (values[i, j] > 0) yield return (i, i, j);
        }
    }
}
