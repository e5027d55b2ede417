namespace CommunityLead.Rules.Reports.Protection;

/// <summary>
/// One kit as the protected table sees it: its report month (yyyymm), its value in each dimension (an index into
/// that dimension's values) and its outcome leaf (one leaf per kit, so a kit's counts form a single tree).
/// </summary>
public sealed record TableRecord(int Month, int[] Values, int Leaf)
{
    public TableRecord With(int dimension, int value)
    {
        var values = (int[])Values.Clone();
        values[dimension] = value;
        return this with { Values = values };
    }

    public bool SameAs(TableRecord other) => Month == other.Month && Leaf == other.Leaf && Values.AsSpan().SequenceEqual(other.Values);
}

/// <summary>A published count: a period node, a dimension and its value (or -1, -1 for the whole kind), and a column.</summary>
public readonly record struct CellKey(long Node, int Dimension, int Value, int Column);

/// <summary>How many values each dimension has, and the columns: each a set of leaves (one leaf, or a sum of leaves).</summary>
public sealed class TableShape
{
    public TableShape(int[] dimensionSizes, int leaves, int[][] columnLeaves)
    {
        DimensionSizes = dimensionSizes;
        Leaves = leaves;
        ColumnLeaves = columnLeaves;
        ColumnsOfLeaf = [.. Enumerable.Range(0, leaves).Select(l => Enumerable.Range(0, columnLeaves.Length).Where(c => columnLeaves[c].Contains(l)).ToArray())];
    }

    public int[] DimensionSizes { get; }
    public int Leaves { get; }
    public int[][] ColumnLeaves { get; }
    public int[][] ColumnsOfLeaf { get; }
    public bool InColumn(int leaf, int column) => Array.IndexOf(ColumnLeaves[column], leaf) >= 0;
    public bool IsWhole(int column) => ColumnLeaves[column].Length == Leaves;
}

/// <summary>The fixed periods: a month, its quarter, its year, and all time; quarters and years are unions of months.</summary>
public static class PeriodNode
{
    public const long All = 3_000_000;

    public static long Quarter(int month) => 1_000_000 + month / 100 * 10 + (month % 100 + 2) / 3;
    public static long Year(int month) => 2_000_000 + month / 100;
    public static long[] Of(int month) => [month, Quarter(month), Year(month), All];
    public static bool Contains(long node, int month) => node == month || node == Quarter(month) || node == Year(month) || node == All;
    public static int Level(long node) => node < 1_000_000 ? 0 : node < 2_000_000 ? 1 : node < All ? 2 : 3;

    public static long Parent(long node) => Level(node) switch
    {
        0 => Quarter((int)node),
        1 => 2_000_000 + (node - 1_000_000) / 10,
        _ => All,
    };
}
