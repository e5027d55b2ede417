using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.Calendar;

/// <summary>The program's calendar: its time zone and today's date there. Nothing about any home.</summary>
public sealed record ProgramCalendarInfo(string TimeZone, DateOnly Today);

public static class CalendarEndpoints
{
    // GET /api/calendar   open: the pages show every date and time on the program's calendar, not the viewer's computer's
    public static void MapCalendar(this IEndpointRouteBuilder app) =>
        app.MapGet("/api/calendar", Get).AllowAnonymous().WithTags("Calendar").WithName("getCalendar")
            .WithSummary("The program's time zone (Program:TimeZone) and today's date in it (no key needed)");

    private static Ok<ProgramCalendarInfo> Get(ProgramCalendar calendar) =>
        TypedResults.Ok(new ProgramCalendarInfo(calendar.Zone.Id, calendar.Today()));
}
