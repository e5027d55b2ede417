using System.Runtime.InteropServices;

namespace CommunityLead.Rules.Reports.Protection;

/// <summary>
/// Decides, once for the whole protected table set, which counts to hide. Every count from 1 to the threshold is
/// hidden (primary suppression, after the CMS cell size suppression policy). Then, for each of them, the protector
/// builds other possible sets of kits — the same kits with one moved to another area, month or band, swapped with a
/// kit going the other way, or at worst one kit fewer or one more — and hides every count that differs in any of them
/// (complementary suppression). Each such set reproduces every shown count, so nobody holding every published number
/// can tell them apart, and the hidden count can lie anywhere between its lowest and highest value among them: the
/// protector keeps building until that range is at least the minimum. This is the hypercube idea (Repsilber 1994;
/// Giessing and Repsilber 2002; Hundepool et al. 2012, ch. 4) made concrete: a move in one dimension, paired with a
/// kit moved back, is the pair of corners of a hypercube, and building it from real kits proves it is possible.
/// </summary>
public sealed partial class TableProtector
{
    private readonly TableRecord[] records;
    private readonly TableShape shape;
    private readonly Func<TableRecord, TableRecord, TableRecord> fit;
    private readonly Dictionary<CellKey, int> counts = [];
    private readonly HashSet<CellKey> hidden = [];
    private readonly HashSet<(long, int, int)> reshuffled = [];
    private readonly Dictionary<CellKey, int> lowered = [], raised = [];
    private readonly Dictionary<int, List<int>> byMonth;
    private readonly Dictionary<(int Month, int Dimension), Dictionary<int, List<int>>> byValue = [];
    private readonly int[] months;

    private TableProtector(IReadOnlyList<TableRecord> records, TableShape shape, Func<TableRecord, TableRecord, TableRecord> fit)
    {
        this.records = [.. records];
        this.shape = shape;
        this.fit = fit;
        byMonth = Enumerable.Range(0, this.records.Length).GroupBy(i => this.records[i].Month).ToDictionary(g => g.Key, g => g.ToList());
        months = [.. byMonth.Keys.Order()];
        Count();
    }

    /// <summary>
    /// Every count of the set. Each kit adds to one cell per dimension in its own month and leaf; the quarters, years,
    /// "all" and the summed columns are then added up from those few thousand cells instead of from every kit again
    /// (a million kits would otherwise make over a hundred million additions).
    /// </summary>
    private void Count()
    {
        var monthly = new Dictionary<(int Month, int Dimension, int Value, int Leaf), int>();
        foreach (var r in records)
            for (var d = -1; d < shape.DimensionSizes.Length; d++)
                CollectionsMarshal.GetValueRefOrAddDefault(monthly, (r.Month, d, d < 0 ? -1 : r.Values[d], r.Leaf), out _)++;
        foreach (var ((month, d, value, leaf), n) in monthly)
            foreach (var node in PeriodNode.Of(month))
                foreach (var column in shape.ColumnsOfLeaf[leaf])
                    CollectionsMarshal.GetValueRefOrAddDefault(counts, new CellKey(node, d, value, column), out _) += n;
    }

    /// <param name="fit">
    /// Given a kit and a changed copy, the copy made consistent with what the domain makes plain (an overall band is
    /// never below the lead band), so no other possible set of kits could be ruled out by knowing the rules.
    /// </param>
    public static ProtectedTable Protect(IReadOnlyList<TableRecord> records, TableShape shape, ProtectionSettings settings,
        Func<TableRecord, TableRecord, TableRecord> fit)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(settings.Threshold);
        ArgumentOutOfRangeException.ThrowIfLessThan(settings.MinimumRange, 1);
        var p = new TableProtector(records, shape, fit);
        var small = p.counts.Where(c => c.Value <= settings.Threshold).Select(c => c.Key)
            .OrderBy(k => PeriodNode.Level(k.Node)).ThenBy(k => k.Node).ThenBy(k => k.Dimension).ThenBy(k => k.Value).ThenBy(k => k.Column)
            .ToList();
        p.hidden.UnionWith(small);
        var narrowest = int.MaxValue;
        foreach (var s in small)
            narrowest = Math.Min(narrowest, p.Protect(s, settings.MinimumRange));
        return new ProtectedTable(p.counts, p.hidden, p.reshuffled, narrowest, small.Count);
    }

    /// <summary>Builds sets of kits lowering and raising s until its range is wide enough; returns the range proved.</summary>
    private int Protect(CellKey s, int minimumRange)
    {
        // Sets built for earlier counts often move this one too (a month's move moves its quarter and year).
        if (Range(s) >= minimumRange) return Range(s);
        var lowerBy = Math.Min(counts[s], minimumRange);
        if (lowered.GetValueOrDefault(s) < lowerBy) Build(s, -1, lowerBy);
        if (Range(s) < minimumRange) Build(s, +1, minimumRange - lowered.GetValueOrDefault(s));
        return Range(s);
    }

    private int Range(CellKey s) => lowered.GetValueOrDefault(s) + raised.GetValueOrDefault(s);

    /// <summary>One other possible set of kits: s moves by one per step, each step the change that hides least.</summary>
    private void Build(CellKey s, int direction, int steps)
    {
        var used = new HashSet<int>();
        var changes = new List<Change>();
        for (var step = 0; step < steps; step++)
        {
            var best = Cheapest(s, direction, direction < 0 ? LowerCandidates(s, used) : RaiseCandidates(s, used));
            if (best is null) break;
            foreach (var change in best)
                if (change.Index >= 0) used.Add(change.Index);
            changes.AddRange(best);
            hidden.UnionWith(Delta(best).Keys);
        }
        Commit(changes);
    }

    private Change[]? Cheapest(CellKey s, int direction, IEnumerable<Change[]> candidates)
    {
        Change[]? best = null;
        var bestCost = long.MaxValue;
        foreach (var raw in candidates)
        {
            var candidate = raw.Select(c => c.Before is { } b && c.After is { } a ? c with { After = fit(b, a) } : c).ToArray();
            var delta = Delta(candidate);
            if (delta.GetValueOrDefault(s) != direction) continue;
            // A shown count costs its size (small counts go first, as in the existing line-by-line suppression), plus
            // one so that a change hiding fewer cells wins among zeros.
            var cost = delta.Keys.Where(k => !hidden.Contains(k)).Sum(k => (long)counts.GetValueOrDefault(k) + 1);
            if (cost < bestCost) (best, bestCost) = (candidate, cost);
            if (cost == 0) break; // hides nothing more: none can be cheaper

        }
        return best;
    }

    private void Commit(List<Change> changes)
    {
        foreach (var (cell, d) in Delta(changes))
        {
            hidden.Add(cell);
            var book = d < 0 ? lowered : raised;
            book[cell] = Math.Max(book.GetValueOrDefault(cell), Math.Abs(d));
        }
        foreach (var change in changes) MarkReshuffled(change);
    }

    private void MarkReshuffled(Change change)
    {
        var before = change.Before is { } b ? Groups(b).ToHashSet() : [];
        var after = change.After is { } a ? Groups(a).ToHashSet() : [];
        var leafChanged = change.Before?.Leaf != change.After?.Leaf;
        foreach (var g in before.Union(after))
            if (before.Contains(g) != after.Contains(g) || leafChanged) reshuffled.Add(g);
    }

    private Dictionary<CellKey, int> Delta(IEnumerable<Change> changes)
    {
        var delta = new Dictionary<CellKey, int>();
        void Add(TableRecord r, int sign, long node, int d)
        {
            foreach (var column in shape.ColumnsOfLeaf[r.Leaf])
            {
                var cell = new CellKey(node, d, d < 0 ? -1 : r.Values[d], column);
                delta[cell] = delta.GetValueOrDefault(cell) + sign;
            }
        }
        foreach (var change in changes)
        {
            var before = change.Before is { } b ? PeriodNode.Of(b.Month) : null;
            var after = change.After is { } a ? PeriodNode.Of(a.Month) : null;
            for (var i = 0; i < 4; i++)
                for (var d = -1; d < shape.DimensionSizes.Length; d++)
                {
                    // Most of a kit's cells are the same before and after a move: only the moved dimension changes.
                    if (before is not null && after is not null && before[i] == after[i] && change.Before!.Leaf == change.After!.Leaf
                        && (d < 0 || change.Before.Values[d] == change.After.Values[d])) continue;
                    if (before is not null) Add(change.Before!, -1, before[i], d);
                    if (after is not null) Add(change.After!, +1, after[i], d);
                }
        }
        foreach (var zero in delta.Where(d => d.Value == 0).Select(d => d.Key).ToList()) delta.Remove(zero);
        return delta;
    }

    private IEnumerable<(long, int, int)> Groups(TableRecord r)
    {
        foreach (var node in PeriodNode.Of(r.Month))
            for (var d = -1; d < shape.DimensionSizes.Length; d++)
                yield return (node, d, d < 0 ? -1 : r.Values[d]);
    }

    /// <summary>Kit Index changed from Before to After; Index -1 with no Before is one kit more, no After one fewer.</summary>
    private sealed record Change(int Index, TableRecord? Before, TableRecord? After);
}
