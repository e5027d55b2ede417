namespace CommunityLead.Rules.Reports;

/// <summary>Which counts of a table to hide, and which of its totals.</summary>
/// <param name="Suppressed">Same shape as the counts: true where the count (and any percentage of it) must not be shown.</param>
/// <param name="Reason">Plain words for the report's footnote.</param>
public sealed record SuppressedTable(bool[][] Suppressed, string Reason)
{
    /// <summary>
    /// One per row: true where the row's total must be hidden too. Only happens when a row has no other non-zero count
    /// to hide beside a small one (or in a one-column table, where each row total is the count itself).
    /// </summary>
    public bool[] RowTotalsSuppressed { get; init; } = new bool[Suppressed.Length];

    /// <summary>One per column: true where the column's total must be hidden too (see <see cref="RowTotalsSuppressed"/>).</summary>
    public bool[] ColumnTotalsSuppressed { get; init; } = new bool[Suppressed.Length == 0 ? 0 : Suppressed[0].Length];

    /// <summary>True when the total of the whole table must be hidden (a table with a single non-zero count, for one).</summary>
    public bool GrandTotalSuppressed { get; init; }

    /// <summary>True when anything at all is hidden.</summary>
    public bool HidesAnything => GrandTotalSuppressed || RowTotalsSuppressed.Any(s => s) || ColumnTotalsSuppressed.Any(s => s)
        || Suppressed.Any(row => row.Any(s => s));
}
