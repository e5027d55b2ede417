using System.Globalization;
using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace CommunityLead.Api.Data;

/// <summary>
/// A DateTimeOffset as text with its offset, in the layout EF Core's SQLite provider uses
/// ("2026-04-09 06:40:00-05:00"), so both stores hold the same characters.
/// </summary>
public sealed class OffsetTextConverter() : ValueConverter<DateTimeOffset, string>(
    v => v.ToString(Format, CultureInfo.InvariantCulture),
    v => DateTimeOffset.ParseExact(v, Format, CultureInfo.InvariantCulture, DateTimeStyles.None))
{
    private const string Format = "yyyy'-'MM'-'dd HH':'mm':'ss.FFFFFFFzzz";
}
