namespace CommunityLead.Api.Features.Kits.Labels;

/// <summary>
/// A sheet of sticky labels: page size, grid and margins, in points (1/72 inch). Both layouts are the usual
/// stock sizes (common practice; dimensions from memory of the common stock, check against the box before a
/// large print run): US Letter 30-up address labels and A4 21-up labels.
/// </summary>
public sealed record LabelStock(
    string Name, double PageWidth, double PageHeight, int Columns, int Rows,
    double LabelWidth, double LabelHeight, double Left, double Top, double ColumnGap, double RowGap)
{
    private const double Inch = 72;
    private const double Mm = 72 / 25.4;

    /// <summary>US Letter, 3 × 10 labels of 2⅝ × 1 in, ½ in top margin, 3⁄16 in sides, ⅛ in between columns.</summary>
    public static readonly LabelStock Letter30 = new("letter-30", 8.5 * Inch, 11 * Inch, 3, 10,
        2.625 * Inch, 1 * Inch, 0.1875 * Inch, 0.5 * Inch, 0.125 * Inch, 0);

    /// <summary>A4, 3 × 7 labels of 63.5 × 38.1 mm, 15.15 mm top margin, 7.2 mm sides, 2.5 mm between columns.</summary>
    public static readonly LabelStock A4x21 = new("a4-21", 210 * Mm, 297 * Mm, 3, 7,
        63.5 * Mm, 38.1 * Mm, 7.2 * Mm, 15.15 * Mm, 2.5 * Mm, 0);

    public static readonly IReadOnlyList<LabelStock> All = [Letter30, A4x21];

    public int PerSheet => Columns * Rows;

    /// <summary>The top-left corner of the label at a position on its sheet (row by row).</summary>
    public (double X, double Y) Corner(int index) =>
        (Left + index % Columns * (LabelWidth + ColumnGap), Top + index / Columns % Rows * (LabelHeight + RowGap));
}
