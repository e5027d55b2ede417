using System.Globalization;
using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>
/// Dates as people write them: "April 3, 2026" and "3 de abril de 2026". Month names are spelled out here rather
/// than taken from the culture data, which the service runs without (InvariantGlobalization): a letter must
/// render the same bytes on every machine.
/// </summary>
internal static class LetterDates
{
    private static readonly string[] English =
        ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

    private static readonly string[] Spanish =
        ["enero", "febrero", "marzo", "abril", "mayo", "junio", "julio", "agosto", "septiembre", "octubre", "noviembre", "diciembre"];

    public static string Write(DateOnly date, LetterLanguage language)
    {
        var day = date.Day.ToString(CultureInfo.InvariantCulture);
        var year = date.Year.ToString(CultureInfo.InvariantCulture);
        return language == LetterLanguage.Es
            ? $"{day} de {Spanish[date.Month - 1]} de {year}"
            : $"{English[date.Month - 1]} {day}, {year}";
    }
}
