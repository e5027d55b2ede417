using System.Globalization;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The PDF's creation date, taken from the date printed on the letter so re-rendering gives the same bytes:
/// midnight UTC of "April 3, 2026" or "3 de abril de 2026" (the composer's two forms) or of "2026-04-03".
/// </summary>
internal static class LetterDate
{
    /// <summary>Used when the letter's date can't be read: any fixed value keeps the bytes reproducible.</summary>
    public static readonly DateTime Unreadable = new(2000, 1, 1, 0, 0, 0, DateTimeKind.Utc);

    private static readonly string[] SpanishMonths =
        ["enero", "febrero", "marzo", "abril", "mayo", "junio", "julio", "agosto", "septiembre", "octubre", "noviembre", "diciembre"];

    public static DateTime MidnightOf(string date)
    {
        var text = date.Trim();
        string[] formats = ["MMMM d, yyyy", "MMM d, yyyy", "yyyy-MM-dd"];
        if (DateTime.TryParseExact(text, formats, CultureInfo.InvariantCulture, DateTimeStyles.AdjustToUniversal | DateTimeStyles.AssumeUniversal, out var parsed))
            return DateTime.SpecifyKind(parsed.Date, DateTimeKind.Utc);

        var parts = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (parts is [var day, "de", var month, "de", var year]
            && int.TryParse(day, CultureInfo.InvariantCulture, out var d)
            && int.TryParse(year, CultureInfo.InvariantCulture, out var y)
            && Array.IndexOf(SpanishMonths, month.ToLowerInvariant()) is var m and >= 0
            && y is >= 1 and <= 9999 && d >= 1 && d <= DateTime.DaysInMonth(y, m + 1))
            return new DateTime(y, m + 1, d, 0, 0, 0, DateTimeKind.Utc);
        return Unreadable;
    }
}
