using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Column widths for the results table. Narrow columns (a metal, a result) get all the room they want, so short
/// cells never wrap; wide columns share what is left in proportion to their text, never below their longest
/// word (a number with its unit counts as one word).
/// </summary>
internal static class TableColumns
{
    public static double[] Widths(TextMeasure measure, LetterFonts fonts, ResultTable table, int columns, double width, double padX)
    {
        var natural = new double[columns];
        var minimum = new double[columns];
        void Consider(IReadOnlyList<string> cells, XFont font)
        {
            for (var c = 0; c < cells.Count; c++)
            {
                natural[c] = Math.Max(natural[c], measure.Width(cells[c], font) + 2 * padX);
                var longestUnit = TextMeasure.Units(cells[c]).Select(unit => measure.Width(unit, font)).DefaultIfEmpty(0).Max();
                minimum[c] = Math.Max(minimum[c], longestUnit + 2 * padX);
            }
        }
        Consider(table.Headers, fonts.BodyBold);
        foreach (var row in table.Rows)
            Consider(row, fonts.Body);

        var naturalSum = natural.Sum();
        if (naturalSum <= width)
            return natural.Select(n => naturalSum == 0 ? width / columns : n + (width - naturalSum) * n / naturalSum).ToArray();
        return Squeezed(natural, minimum, width);
    }

    private static double[] Squeezed(double[] natural, double[] minimum, double width)
    {
        // Columns that want no more than an even share of the room left keep their natural width; repeat, since
        // each one settled leaves more for the rest.
        var settled = new bool[natural.Length];
        for (var changed = true; changed;)
        {
            changed = false;
            var open = Enumerable.Range(0, natural.Length).Where(c => !settled[c]).ToList();
            var room = width - Enumerable.Range(0, natural.Length).Where(c => settled[c]).Sum(c => natural[c]);
            foreach (var c in open.Where(c => natural[c] <= room / open.Count))
                (settled[c], changed) = (true, true);
        }

        var wide = Enumerable.Range(0, natural.Length).Where(c => !settled[c]).ToList();
        var left = width - Enumerable.Range(0, natural.Length).Where(c => settled[c]).Sum(c => natural[c]);
        var wideNatural = wide.Sum(c => natural[c]);
        var widths = (double[])natural.Clone();
        foreach (var c in wide)
            widths[c] = left * natural[c] / wideNatural;
        if (wide.All(c => widths[c] >= minimum[c]))
            return widths;

        // A long word would be cut: fall back to giving every column its longest word first.
        double minimumSum = minimum.Sum(), naturalSum = natural.Sum();
        if (minimumSum >= width)
            return minimum.Select(m => width * m / minimumSum).ToArray();
        var share = (width - minimumSum) / (naturalSum - minimumSum);
        return minimum.Select((m, c) => m + (natural[c] - m) * share).ToArray();
    }
}
