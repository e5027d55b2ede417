using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Calendar;

public class CalendarTests
{
    [Theory]
    [InlineData("UTC", "2026-04-10")]
    [InlineData("America/Chicago", "2026-04-09")]
    public async Task Calendar_TodayIsTheProgramsDate_OpenWithoutAKey(string zone, string today)
    {
        // 2026-04-10 02:00 UTC is 9 p.m. on 9 April in Chicago (CDT, UTC−5; IANA tz database).
        using var app = new CommunityLeadFactory(new DateTimeOffset(2026, 4, 10, 2, 0, 0, TimeSpan.Zero))
        {
            Settings = { ["Program:TimeZone"] = zone },
        };
        var calendar = await GetAsync(app.CreateClient(), "/api/calendar");
        Assert.Equal(zone, calendar["timeZone"]!.GetValue<string>());
        Assert.Equal(today, calendar["today"]!.GetValue<string>());
    }
}
