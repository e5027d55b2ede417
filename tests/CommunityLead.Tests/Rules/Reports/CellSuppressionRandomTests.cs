using CommunityLead.Rules.Reports;

namespace CommunityLead.Tests.Rules.Reports;

// Adversarial by volume: many seeded random tables, heavy in zeros and small counts, each attacked three ways.
public class CellSuppressionRandomTests
{
    [Theory]
    [InlineData(1, 5)]
    [InlineData(2, 10)]
    [InlineData(3, 20)]
    public void Suppress_RandomTables_NoHiddenCountRecovered(int seed, int threshold)
    {
        var random = new Random(seed);
        for (var trial = 0; trial < 150; trial++)
        {
            int rows = random.Next(1, 7), columns = random.Next(1, 7);
            var counts = Enumerable.Range(0, rows).Select(_ => Enumerable.Range(0, columns).Select(_ => random.NextDouble() switch
            {
                < 0.3 => 0,
                < 0.7 => random.Next(1, threshold + 3),
                _ => random.Next(threshold, 200),
            }).ToArray()).ToArray();
            var table = CellSuppression.Suppress(counts, threshold);
            CellSuppressionTests.AssertSafe(counts, threshold, table);
            // The same table always gets the same answer.
            Assert.Equal(table.Suppressed, CellSuppression.Suppress(counts, threshold).Suppressed);
        }
    }

    // The usual rule of thumb, two hidden entries in every row and column that has one, follows from the cycle rule.
    [Fact]
    public void Suppress_RandomTables_EveryHiddenLineHoldsTwo()
    {
        var random = new Random(4);
        for (var trial = 0; trial < 200; trial++)
        {
            var counts = Enumerable.Range(0, random.Next(2, 6))
                .Select(_ => Enumerable.Range(0, 4).Select(_ => random.Next(0, 3) == 0 ? random.Next(0, 12) : random.Next(11, 90)).ToArray())
                .ToArray();
            var table = CellSuppression.Suppress(counts, CellSuppression.DefaultThreshold);
            for (var i = 0; i < counts.Length; i++)
            {
                var inRow = table.Suppressed[i].Count(h => h) + (table.RowTotalsSuppressed[i] ? 1 : 0);
                Assert.True(inRow is 0 or >= 2);
            }
            for (var j = 0; j < 4; j++)
            {
                var inColumn = table.Suppressed.Count(r => r[j]) + (table.ColumnTotalsSuppressed[j] ? 1 : 0);
                Assert.True(inColumn is 0 or >= 2);
            }
        }
    }
}
