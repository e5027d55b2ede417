using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Infrastructure;

/// <summary>Settings section "Program": what is true of the whole program rather than of one feature.</summary>
public sealed class ProgramOptions
{
    /// <summary>
    /// The IANA time zone the program works in ("America/Chicago"): letter dates, "today" and days counted from a
    /// collection follow it. Stored times stay UTC (with the offset they were given). Default UTC.
    /// </summary>
    public string TimeZone { get; set; } = "UTC";
}

/// <summary>
/// Calendar dates as the program's staff and households read them. A letter issued at 7 p.m. in the Americas was
/// dated the next day when dates were taken from UTC, and days-to-letter mixed a UTC date with a local one.
/// </summary>
public sealed class ProgramCalendar(IOptions<ProgramOptions> options, TimeProvider clock)
{
    private readonly TimeZoneInfo zone = TimeZoneInfo.FindSystemTimeZoneById(options.Value.TimeZone);

    public TimeZoneInfo Zone => zone;

    public DateOnly Today() => DateOf(clock.GetUtcNow().UtcDateTime);

    /// <summary>The program's calendar date of a UTC instant.</summary>
    public DateOnly DateOf(DateTime utc) =>
        DateOnly.FromDateTime(TimeZoneInfo.ConvertTimeFromUtc(DateTime.SpecifyKind(utc, DateTimeKind.Utc), zone));
}
