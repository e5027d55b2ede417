namespace CommunityLead.Rules.Reports.Protection;

/// <summary>
/// Every count of the protected table set with its decision (shown or hidden), and the groups whose kits differ in at
/// least one of the other possible sets of kits: a statistic of such a group (a median, a percentile) would tell the
/// sets apart, so it is never shown.
/// </summary>
public sealed class ProtectedTable(
    IReadOnlyDictionary<CellKey, int> counts, IReadOnlySet<CellKey> hidden,
    IReadOnlySet<(long Node, int Dimension, int Value)> reshuffled, int narrowestRange, int sensitive)
{
    public int Count(CellKey key) => counts.GetValueOrDefault(key);
    public bool IsHidden(CellKey key) => hidden.Contains(key);
    public bool KeptWhole(long node, int dimension, int value) => !reshuffled.Contains((node, dimension, value));

    /// <summary>Cells with at least one kit, and how many of every cell are hidden (some hidden cells are zeros).</summary>
    public int NonZeroCells => counts.Count;
    public int HiddenCells => hidden.Count;
    /// <summary>Counts from 1 to the threshold: all hidden.</summary>
    public int SmallCounts => sensitive;
    /// <summary>The narrowest range the service proved for any small count (int.MaxValue when none).</summary>
    public int NarrowestRange => narrowestRange;
}
