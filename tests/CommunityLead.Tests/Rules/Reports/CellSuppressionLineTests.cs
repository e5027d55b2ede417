using CommunityLead.Rules.Reports;

namespace CommunityLead.Tests.Rules.Reports;

// One-row and one-column tables, where the "other" totals are the counts themselves: a column total in a one-row
// table is that column's count, so hiding a count hides that total too. Counts 1–10 hidden [published: CMS].
public class CellSuppressionLineTests
{
    private const int Cms = CellSuppression.DefaultThreshold;

    // One row 3, 50, 60 (total 113): hide 3 and the smallest other count, 50; the total stays, 113 − 60 = 53 = 3 + 50
    // can't be split. Hiding the total instead would also work but loses more (three totals against one count).
    [Fact]
    public void Suppress_OneRow_HidesSmallestOtherCount()
    {
        int[][] counts = [[3, 50, 60]];
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal([[true, true, false]], table.Suppressed);
        Assert.Equal([true, true, false], table.ColumnTotalsSuppressed);
        Assert.Equal([false], table.RowTotalsSuppressed);
        Assert.False(table.GrandTotalSuppressed);
        CellSuppressionTests.AssertSafe(counts, Cms, table);
    }

    [Fact]
    public void Suppress_OneColumn_HidesSmallestOtherCount()
    {
        int[][] counts = [[60], [3], [50], [0]];
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal([[false], [true], [true], [false]], table.Suppressed);
        Assert.Equal([false, true, true, false], table.RowTotalsSuppressed);
        Assert.Equal([false], table.ColumnTotalsSuppressed);
        CellSuppressionTests.AssertSafe(counts, Cms, table);
    }

    // The only non-zero count is small: nothing else can cover it, so the total goes too.
    [Theory]
    [InlineData(new[] { 3, 0, 0 })]
    [InlineData(new[] { 4 })]
    public void Suppress_OneRowOnlySmallCount_HidesTotal(int[] row)
    {
        int[][] counts = [row];
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.True(table.Suppressed[0][0]);
        Assert.Equal([true], table.RowTotalsSuppressed);
        Assert.True(table.GrandTotalSuppressed);
        CellSuppressionTests.AssertSafe(counts, Cms, table);
    }

    [Fact]
    public void Suppress_OneColumnOnlySmallCount_HidesTotal()
    {
        int[][] counts = [[0], [7], [0]];
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal([[false], [true], [false]], table.Suppressed);
        Assert.Equal([true], table.ColumnTotalsSuppressed);
        Assert.True(table.GrandTotalSuppressed);
        CellSuppressionTests.AssertSafe(counts, Cms, table);
    }

    // Several small counts in one row protect each other; the big ones show.
    [Fact]
    public void Suppress_OneRowTwoSmall_NoMoreHidden()
    {
        int[][] counts = [[3, 8, 60, 70]];
        var table = CellSuppression.Suppress(counts, Cms);
        Assert.Equal([[true, true, false, false]], table.Suppressed);
        Assert.False(table.GrandTotalSuppressed);
        CellSuppressionTests.AssertSafe(counts, Cms, table);
    }
}
