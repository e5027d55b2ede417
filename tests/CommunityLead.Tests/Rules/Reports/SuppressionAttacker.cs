using CommunityLead.Rules.Reports;
using MathNet.Numerics.LinearAlgebra;

namespace CommunityLead.Tests.Rules.Reports;

/// <summary>
/// What someone holding a published table can work out. They see every shown count, every shown total (percentages of
/// totals carry the same figures) and know that each row adds up to its total, each column to its total, and the
/// totals to the grand total. Entries are addressed on the (rows + 1) × (columns + 1) grid: the last column holds row
/// totals, the last row column totals, the corner the grand total. Written apart from the production code.
/// </summary>
internal sealed class SuppressionAttacker
{
    private readonly long[,] truth;
    private readonly bool[,] hidden;
    private readonly int rows, columns;

    public SuppressionAttacker(int[][] counts, SuppressedTable table)
    {
        rows = counts.Length;
        columns = rows == 0 ? 0 : counts[0].Length;
        truth = new long[rows + 1, columns + 1];
        hidden = new bool[rows + 1, columns + 1];
        for (var i = 0; i < rows; i++)
        for (var j = 0; j < columns; j++)
        {
            truth[i, j] = counts[i][j];
            truth[i, columns] += counts[i][j];
            truth[rows, j] += counts[i][j];
            truth[rows, columns] += counts[i][j];
            hidden[i, j] = table.Suppressed[i][j];
        }
        for (var i = 0; i < rows; i++) hidden[i, columns] = table.RowTotalsSuppressed[i];
        for (var j = 0; j < columns; j++) hidden[rows, j] = table.ColumnTotalsSuppressed[j];
        hidden[rows, columns] = table.GrandTotalSuppressed;
    }

    public IEnumerable<(int Row, int Column)> Hidden =>
        from i in Enumerable.Range(0, rows + 1) from j in Enumerable.Range(0, columns + 1) where hidden[i, j] select (i, j);

    /// <summary>
    /// Each line as its parts and its whole: rows and columns of counts, then the row totals and the column totals
    /// against the grand total.
    /// </summary>
    private IEnumerable<((int, int)[] Parts, (int, int) Whole)> Lines()
    {
        for (var i = 0; i <= rows; i++)
            yield return ([.. Enumerable.Range(0, columns).Select(j => (i, j))], (i, columns));
        for (var j = 0; j <= columns; j++)
            yield return ([.. Enumerable.Range(0, rows).Select(i => (i, j))], (rows, j));
    }

    /// <summary>The brief's attack: a line with one unknown gives it away; repeat until nothing more falls.</summary>
    public Dictionary<(int, int), long> Peel()
    {
        var known = new Dictionary<(int, int), long>();
        for (var i = 0; i <= rows; i++)
        for (var j = 0; j <= columns; j++)
            if (!hidden[i, j]) known[(i, j)] = truth[i, j];
        var recovered = new Dictionary<(int, int), long>();
        for (var progress = true; progress;)
        {
            progress = false;
            foreach (var (parts, whole) in Lines())
            {
                var unknown = parts.Append(whole).Where(e => !known.ContainsKey(e)).ToArray();
                if (unknown.Length != 1) continue;
                var partsKnown = parts.Where(known.ContainsKey).Sum(e => known[e]);
                var value = unknown[0] == whole ? partsKnown : known[whole] - partsKnown;
                known[unknown[0]] = recovered[unknown[0]] = value;
                progress = true;
            }
        }
        return recovered;
    }

    /// <summary>
    /// The full linear attack: entry e is pinned down exactly when its unit vector lies in the row space of the line
    /// equations over the hidden entries, i.e. adding it does not raise the rank.
    /// </summary>
    public IEnumerable<(int, int)> DeterminedByAlgebra()
    {
        var unknowns = Hidden.ToArray();
        if (unknowns.Length == 0) return [];
        var index = unknowns.Select((e, k) => (e, k)).ToDictionary(x => x.e, x => x.k);
        var equations = Lines().Select(line =>
        {
            var row = new double[unknowns.Length];
            foreach (var part in line.Parts.Where(index.ContainsKey)) row[index[part]] = 1;
            if (index.TryGetValue(line.Whole, out var w)) row[w] = -1;
            return row;
        }).ToList();
        var rank = Matrix<double>.Build.DenseOfRowArrays(equations).Rank();
        return unknowns.Where(e =>
        {
            var unit = new double[unknowns.Length];
            unit[index[e]] = 1;
            return Matrix<double>.Build.DenseOfRowArrays([.. equations, unit]).Rank() == rank;
        }).ToArray();
    }

    /// <summary>
    /// A second table of whole, non-negative counts that shows the same as the first and adds up the same, but differs
    /// at entry e; null when the attacker's hunt finds none. Found as a cycle of hidden entries through e, moved by ±1.
    /// </summary>
    public long[,]? Alternative((int Row, int Column) e)
    {
        var path = HiddenPath(e);
        if (path is null) return null;
        var other = (long[,])truth.Clone();
        // Around the cycle e, path…, each line meets two entries: one a part and the whole (same sign), or two parts
        // (opposite signs). Walk it and give each entry the change that keeps the line it shares with the previous one.
        var cycle = new[] { e }.Concat(path).ToArray();
        var change = 1;
        for (var k = 0; k < cycle.Length; k++)
        {
            other[cycle[k].Row, cycle[k].Column] += change;
            var next = cycle[(k + 1) % cycle.Length];
            var bothParts = IsWhole(cycle[k], next) == IsWhole(next, cycle[k]);
            change = bothParts ? -change : change;
        }
        return other;
    }

    public bool Consistent(long[,] other)
    {
        for (var i = 0; i <= rows; i++)
        for (var j = 0; j <= columns; j++)
            if (other[i, j] < 0 || (!hidden[i, j] && other[i, j] != truth[i, j])) return false;
        return Lines().All(line => line.Parts.Sum(p => other[p.Item1, p.Item2]) == other[line.Whole.Item1, line.Whole.Item2]);
    }

    public long Truth((int Row, int Column) e) => truth[e.Row, e.Column];

    // Whether a is the whole of the line that a and b share.
    private bool IsWhole((int Row, int Column) a, (int Row, int Column) b) =>
        a.Row == b.Row ? a.Column == columns : a.Row == rows;

    // Breadth-first through hidden entries from e's row line to e's column line, not using e; lines are ("r", i) / ("c", j).
    private List<(int Row, int Column)>? HiddenPath((int Row, int Column) e)
    {
        var from = new Dictionary<(char, int), ((char, int) Line, (int, int) Entry)>();
        var queue = new Queue<(char, int)>([('r', e.Row)]);
        from[('r', e.Row)] = default;
        while (queue.TryDequeue(out var line))
            foreach (var entry in Hidden.Where(h => h != e && (line.Item1 == 'r' ? h.Row == line.Item2 : h.Column == line.Item2)))
            {
                var across = line.Item1 == 'r' ? ('c', entry.Column) : ('r', entry.Row);
                if (!from.TryAdd(across, (line, entry))) continue;
                if (across == ('c', e.Column))
                {
                    var path = new List<(int, int)>();
                    for (var at = across; at != ('r', e.Row); at = from[at].Line) path.Add(from[at].Entry);
                    return path;
                }
                queue.Enqueue(across);
            }
        return null;
    }
}
