namespace CommunityLead.Rules.Reports.Protection;

/// <summary>
/// The changes tried for one step, cheapest first in spirit: a kit moved along the cell's own dimension with a kit
/// moved back (the totals above stay as they are), a kit moved to another month (for a count of the whole kind), a
/// kit given another result, and last one kit fewer or one more, which always works but hides the most.
/// </summary>
public sealed partial class TableProtector
{
    private const int Partners = 12;

    private IEnumerable<Change[]> LowerCandidates(CellKey s, HashSet<int> used)
    {
        var whole = shape.IsWhole(s.Column);
        foreach (var a in Members(s).Where(i => !used.Contains(i)).Take(3))
        {
            var ra = records[a];
            if (s.Dimension >= 0)
            {
                var d = s.Dimension;
                if (!whole)
                    foreach (var b in byMonth[ra.Month].Where(b => b != a && !used.Contains(b) && records[b].Values[d] != s.Value
                                 && !shape.InColumn(records[b].Leaf, s.Column)).Take(Partners))
                        yield return [new(a, ra, ra.With(d, records[b].Values[d])), new(b, records[b], records[b].With(d, s.Value))];
                for (var g = 0; g < shape.DimensionSizes[d]; g++)
                    if (g != s.Value) yield return [new(a, ra, ra.With(d, g))];
            }
            else if (s.Node != PeriodNode.All)
                foreach (var m in OtherMonths(s.Node).Take(4))
                {
                    if (!whole)
                        foreach (var b in byMonth[m].Where(b => !used.Contains(b) && !shape.InColumn(records[b].Leaf, s.Column)).Take(4))
                            yield return [new(a, ra, ra with { Month = m }), new(b, records[b], records[b] with { Month = ra.Month })];
                    yield return [new(a, ra, ra with { Month = m })];
                }
            if (!whole)
                for (var l = 0; l < shape.Leaves; l++)
                    if (!shape.InColumn(l, s.Column)) yield return [new(a, ra, ra with { Leaf = l })];
            yield return [new(a, ra, null)];
        }
    }

    private IEnumerable<Change[]> RaiseCandidates(CellKey s, HashSet<int> used)
    {
        var whole = shape.IsWhole(s.Column);
        if (s.Dimension >= 0)
        {
            var d = s.Dimension;
            var incoming = MonthsIn(s.Node).SelectMany(m => byMonth[m])
                .Where(c => !used.Contains(c) && records[c].Values[d] != s.Value && shape.InColumn(records[c].Leaf, s.Column)).Take(Partners);
            foreach (var c in incoming)
            {
                var rc = records[c];
                if (!whole)
                    foreach (var b in WithValue(rc.Month, d, s.Value).Where(b => b != c && !used.Contains(b)
                                 && !shape.InColumn(records[b].Leaf, s.Column)).Take(4))
                        yield return [new(c, rc, rc.With(d, s.Value)), new(b, records[b], records[b].With(d, rc.Values[d]))];
                yield return [new(c, rc, rc.With(d, s.Value))];
            }
        }
        else if (s.Node != PeriodNode.All)
        {
            var targets = MonthsIn(s.Node).Take(2).ToList();
            var incoming = OtherMonths(s.Node).SelectMany(m => byMonth[m])
                .Where(c => !used.Contains(c) && shape.InColumn(records[c].Leaf, s.Column)).Take(8);
            foreach (var c in incoming)
                foreach (var m in targets)
                {
                    var rc = records[c];
                    if (!whole)
                        foreach (var b in byMonth[m].Where(b => !used.Contains(b) && !shape.InColumn(records[b].Leaf, s.Column)).Take(4))
                            yield return [new(c, rc, rc with { Month = m }), new(b, records[b], records[b] with { Month = rc.Month })];
                    yield return [new(c, rc, rc with { Month = m })];
                }
        }
        if (!whole)
        {
            var group = new CellKey(s.Node, s.Dimension, s.Value, Array.FindIndex(shape.ColumnLeaves, c => c.Length == shape.Leaves));
            foreach (var r in Members(group).Where(r => !used.Contains(r) && !shape.InColumn(records[r].Leaf, s.Column)).Take(8))
                foreach (var l in shape.ColumnLeaves[s.Column])
                    yield return [new(r, records[r], records[r] with { Leaf = l })];
        }
        foreach (var a in Members(s).Take(1))
            yield return [new(-1, null, records[a])];
    }

    /// <summary>The kits counted in s (a group with no column covering every leaf counts by the cell's own leaves).</summary>
    private IEnumerable<int> Members(CellKey s) =>
        MonthsIn(s.Node).SelectMany(m => s.Dimension < 0 ? byMonth[m] : WithValue(m, s.Dimension, s.Value))
            .Where(i => s.Column < 0 || shape.InColumn(records[i].Leaf, s.Column));

    /// <summary>
    /// The kits of one month with one value in one dimension, split out the first time that month and dimension are
    /// asked: a small count's kits are then found among themselves, not by reading the whole month for each move.
    /// </summary>
    private List<int> WithValue(int month, int dimension, int value)
    {
        if (!byValue.TryGetValue((month, dimension), out var split))
            byValue[(month, dimension)] = split = byMonth[month].GroupBy(i => records[i].Values[dimension]).ToDictionary(g => g.Key, g => g.ToList());
        return split.TryGetValue(value, out var kits) ? kits : [];
    }

    private IEnumerable<int> MonthsIn(long node) => months.Where(m => PeriodNode.Contains(node, m));

    /// <summary>Months outside the node, nearest first (same quarter, then same year), so fewer totals move.</summary>
    private IEnumerable<int> OtherMonths(long node)
    {
        var parent = PeriodNode.Parent(node);
        var grandparent = PeriodNode.Parent(parent);
        return months.Where(m => !PeriodNode.Contains(node, m))
            .OrderBy(m => PeriodNode.Contains(parent, m) ? 0 : PeriodNode.Contains(grandparent, m) ? 1 : 2).ThenBy(m => m);
    }
}
