using CommunityLead.Rules.Reports;

namespace CommunityLead.Tests.Rules.Reports;

// Small-cell suppression: counts 1–10 hidden, zero may show [published: CMS cell size suppression policy, DOMAIN.md §7].
public class CellSuppressionTests
{
    private const int Cms = CellSuppression.DefaultThreshold;

    private static int[][] Table(params int[][] rows) => rows;

    private static bool[][] Mask(int[][] counts, params (int Row, int Column)[] hidden) =>
        [.. counts.Select((row, i) => row.Select((_, j) => hidden.Contains((i, j))).ToArray())];

    /// <summary>Every attack fails on every hidden entry, and the rules on what may be hidden hold.</summary>
    internal static void AssertSafe(int[][] counts, int threshold, SuppressedTable table)
    {
        var attacker = new SuppressionAttacker(counts, table);
        Assert.Empty(attacker.Peel());
        Assert.Empty(attacker.DeterminedByAlgebra());
        foreach (var entry in attacker.Hidden)
        {
            var other = attacker.Alternative(entry);
            Assert.NotNull(other);
            Assert.True(attacker.Consistent(other));
            Assert.NotEqual(attacker.Truth(entry), other[entry.Row, entry.Column]);
            Assert.True(attacker.Truth(entry) > 0, $"entry {entry} is zero and hidden");
        }
        for (var i = 0; i < counts.Length; i++)
        for (var j = 0; j < counts[i].Length; j++)
            if (counts[i][j] >= 1 && counts[i][j] <= threshold) Assert.True(table.Suppressed[i][j], $"small count at ({i}, {j}) shows");
    }

    [Fact]
    public void Suppress_CmsDefault_IsTen() => Assert.Equal(10, Cms);

    // A lone small count in a big table: the cheapest cycle through it. From (0,0) = 3 the closing paths cost
    // 12 + 15 + 80 = 107 (row 0 → 12 → row 2 → 80) or 12 + 60 + 50 = 122 or 40 + 70 + 50 = 160; the first wins.
    [Fact]
    public void Suppress_LoneSmallCount_HidesCheapestCycle()
    {
        var counts = Table([3, 12, 40], [50, 60, 70], [80, 15, 90]);
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal(Mask(counts, (0, 0), (0, 1), (2, 0), (2, 1)), table.Suppressed);
        Assert.DoesNotContain(true, table.RowTotalsSuppressed);
        Assert.DoesNotContain(true, table.ColumnTotalsSuppressed);
        Assert.Equal("Counts from 1 to 10 are hidden (cell size suppression policy). 3 more counts also hidden so the hidden " +
            "counts cannot be worked out from the totals.", table.Reason);
        AssertSafe(counts, Cms, table);
    }

    // The table without suppression gives the 3 away from its row total: the attacker has teeth.
    [Fact]
    public void Attacker_PrimaryOnly_RecoversTheLoneCount()
    {
        var counts = Table([3, 12, 40], [50, 60, 70], [80, 15, 90]);
        var attacker = new SuppressionAttacker(counts, new SuppressedTable(Mask(counts, (0, 0)), "primary only"));
        Assert.Equal(3, attacker.Peel()[(0, 0)]);
        Assert.Null(attacker.Alternative((0, 0)));
    }

    // Two small counts in different lines: the second serves as a complement of the first, so only 20 and 25 join
    // them (a row or column that already has suppression is preferred, at no cost).
    [Fact]
    public void Suppress_TwoSmallCounts_ShareTheirComplements()
    {
        var counts = Table([3, 20, 30], [25, 4, 35], [40, 45, 50]);
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal(Mask(counts, (0, 0), (0, 1), (1, 0), (1, 1)), table.Suppressed);
        AssertSafe(counts, Cms, table);
    }

    // Already a cycle: four small counts in a 2×2 block protect each other; the 11s, above the threshold, stay shown.
    [Fact]
    public void Suppress_SmallBlock_NoComplementsAndThresholdInclusive()
    {
        var counts = Table([10, 10, 11], [10, 10, 11]);
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal(Mask(counts, (0, 0), (0, 1), (1, 0), (1, 1)), table.Suppressed);
        Assert.Equal("Counts from 1 to 10 are hidden (cell size suppression policy).", table.Reason);
        AssertSafe(counts, Cms, table);
    }

    // Zeros show and are never complements: the cycle goes around them.
    [Fact]
    public void Suppress_Zeros_StayShown()
    {
        var counts = Table([3, 0, 20], [0, 0, 30], [15, 0, 40]);
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal(Mask(counts, (0, 0), (0, 2), (2, 0), (2, 2)), table.Suppressed);
        AssertSafe(counts, Cms, table);
    }

    // Two hidden 2×2 blocks joined by one small count pass "two hidden cells in every line", and peeling lines with
    // one unknown finds nothing, yet the line sums still pin the joining cell: its rows and columns on either side
    // add up to it. The production rule (every hidden entry on a cycle) adds a complement.
    [Fact]
    public void Suppress_TwoBlocksJoinedByOneCell_JoinIsProtected()
    {
        var counts = Table([2, 3, 50, 60], [4, 5, 6, 70], [80, 90, 7, 8], [85, 95, 9, 1]);
        var twoPerLine = Mask(counts, (0, 0), (0, 1), (1, 0), (1, 1), (1, 2), (2, 2), (2, 3), (3, 2), (3, 3));
        var naive = new SuppressionAttacker(counts, new SuppressedTable(twoPerLine, "two per line"));
        Assert.Empty(naive.Peel());
        Assert.Equal([(1, 2)], naive.DeterminedByAlgebra());

        var table = CellSuppression.Suppress(counts, Cms);
        Assert.True(table.Suppressed.Sum(r => r.Count(h => h)) > 9);
        AssertSafe(counts, Cms, table);
    }

    // A small count whose row and column hold nothing else: only the totals can hide it. Hidden: the count, its row
    // total, its column total (both 3) and the grand total; an attacker sees 50 = 50 and 53 − 50 can't be formed.
    [Fact]
    public void Suppress_NoOtherCountInLines_HidesTotals()
    {
        var counts = Table([3, 0], [0, 50]);
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal(Mask(counts, (0, 0)), table.Suppressed);
        Assert.Equal([true, false], table.RowTotalsSuppressed);
        Assert.Equal([true, false], table.ColumnTotalsSuppressed);
        Assert.True(table.GrandTotalSuppressed);
        Assert.Contains("3 totals also hidden", table.Reason);
        AssertSafe(counts, Cms, table);
    }

    // Threshold is a setting: 7 shows under 5, hides under 10 (and then the whole 2×2 is the only cycle), 0 hides nothing.
    [Theory]
    [InlineData(0, false)]
    [InlineData(5, false)]
    [InlineData(7, true)]
    [InlineData(10, true)]
    public void Suppress_Threshold_IsASetting(int threshold, bool hides)
    {
        var counts = Table([7, 30], [40, 50]);
        var table = CellSuppression.Suppress(counts, threshold);
        Assert.Equal(hides, table.HidesAnything);
        Assert.Equal(hides, table.Suppressed.All(r => r.All(h => h)));
        AssertSafe(counts, threshold, table);
    }

    [Fact]
    public void Suppress_NothingSmall_NothingHidden()
    {
        var counts = Table([0, 30], [40, 0]);
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.False(table.HidesAnything);
        Assert.Equal("Counts from 1 to 10 are hidden (cell size suppression policy). None here.", table.Reason);
    }

    [Fact]
    public void Suppress_BadInput_Throws()
    {
        Assert.Throws<ArgumentNullException>(() => CellSuppression.Suppress(null!, Cms));
        Assert.Throws<ArgumentOutOfRangeException>(() => CellSuppression.Suppress(Table([1]), -1));
        Assert.Throws<ArgumentException>(() => CellSuppression.Suppress(Table([1, 2], [3]), Cms));
        Assert.Throws<ArgumentException>(() => CellSuppression.Suppress(Table([1, -2]), Cms));
    }

    [Fact]
    public void Suppress_EmptyTable_NothingHidden() => Assert.False(CellSuppression.Suppress([], Cms).HidesAnything);
}
