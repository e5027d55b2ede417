using System.Globalization;

namespace CommunityLead.Tests.Data;

/// <summary>
/// PostgreSQL enforces every column length and SQLite none, so a length nobody checks turns into a 500 on one
/// store only. Every string column needs a decision in <see cref="ColumnDecisions"/>; enum and time columns are
/// stored as text too, and are checked against every value they can hold.
/// </summary>
public class ColumnLengthTests
{
    public static readonly TheoryData<string> Stores = new() { "sqlite", "postgres" };

    private static IReadOnlyList<StoreModel.Column> Model(string store) =>
        store == "sqlite" ? StoreModel.Sqlite.Value : StoreModel.Postgres.Value;

    [Theory]
    [MemberData(nameof(Stores))]
    public void ColumnLengths_EveryStringColumn_HasADecisionForItsLength(string store)
    {
        var decisions = ColumnDecisions.All.ToDictionary(d => d.Column);
        var wrong = Model(store).Where(c => c.Type == typeof(string))
            .Select(c => decisions.TryGetValue(c.Name, out var d)
                ? d.Limit == c.MaxLength ? null : $"{c.Name}: the table decided for {Text(d.Limit)}, the model has {Text(c.MaxLength)}"
                : $"{c.Name} ({Text(c.MaxLength)}): no decision; add one to ColumnDecisions (validated, bounded, composed or unlimited)")
            .OfType<string>().ToList();
        Assert.True(wrong.Count == 0, string.Join("\n", wrong));
    }

    [Fact]
    public void ColumnLengths_EveryDecision_NamesOneColumnOfTheModel()
    {
        var columns = StoreModel.Sqlite.Value.Where(c => c.Type == typeof(string)).Select(c => c.Name).ToHashSet();
        Assert.All(ColumnDecisions.All, d => Assert.Contains(d.Column, columns));
        Assert.Empty(ColumnDecisions.All.GroupBy(d => d.Column).Where(g => g.Count() > 1).Select(g => g.Key));
    }

    [Fact]
    public void ColumnLengths_BoundedColumns_LongestValueFits()
    {
        var over = ColumnDecisions.All.OfType<Bounded>().Select(d => (d, Longest: d.Longest()))
            .Where(x => x.Longest > x.d.Length).Select(x => $"{x.d.Column}: {x.d.What} can be {x.Longest} characters, the column holds {x.d.Length}");
        Assert.Empty(over);
    }

    [Theory]
    [MemberData(nameof(Stores))]
    public void ColumnLengths_EnumColumns_EveryNameFits(string store)
    {
        // Enums are stored by name (CommunityLeadDb.ConfigureConventions), so the longest name must fit.
        var over = Model(store).Where(c => c.Type.IsEnum)
            .SelectMany(c => Enum.GetNames(c.Type).Where(n => c.MaxLength is null || n.Length > c.MaxLength).Select(n => $"{c.Name}: {n}"));
        Assert.Empty(over);
    }

    [Theory]
    [MemberData(nameof(Stores))]
    public void ColumnLengths_OffsetTimesAsText_TheLongestTimeFits(string store)
    {
        // PostgreSQL keeps household times as text with their offset (OffsetTextConverter); SQLite's provider does too.
        var longest = new DateTimeOffset(9999, 12, 31, 23, 59, 59, TimeSpan.FromHours(14)).AddTicks(9_999_999);
        var over = Model(store).Where(c => c.Type == typeof(DateTimeOffset) && c.MaxLength is not null)
            .Select(c => (c.Name, Text: (string)c.Converter!.ConvertToProvider(longest)!, c.MaxLength))
            .Where(x => x.Text.Length > x.MaxLength).Select(x => $"{x.Name}: \"{x.Text}\"");
        Assert.Empty(over);
    }

    [Theory]
    [MemberData(nameof(Stores))]
    public void ColumnLengths_NothingElse_HasALength(string store)
    {
        var other = Model(store).Where(c => c.MaxLength is not null && c.Type != typeof(string) && !c.Type.IsEnum && c.Type != typeof(DateTimeOffset));
        Assert.Empty(other.Select(c => $"{c.Name} ({c.Type.Name}, {c.MaxLength}): no rule for its length in this test"));
    }

    private static string Text(int? length) => length?.ToString(CultureInfo.InvariantCulture) ?? "no limit";
}
