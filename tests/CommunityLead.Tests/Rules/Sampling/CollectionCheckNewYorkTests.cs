using CommunityLead.Rules.Kits;
using static CommunityLead.Tests.Rules.Sampling.Bottle;

namespace CommunityLead.Tests.Rules.Sampling;

/// <summary>
/// Independent reference for the daylight-saving cases: the IANA tz database entry America/New_York
/// (via TimeZoneInfo) turns the wall-clock times a household reads off its kitchen clock into instants.
/// </summary>
public class CollectionCheckNewYorkTests
{
    private static readonly TimeZoneInfo NewYork = TimeZoneInfo.FindSystemTimeZoneById("America/New_York");

    private static DateTimeOffset Local(int month, int day, int hour, int minute)
    {
        var wallClock = new DateTime(2026, month, day, hour, minute, 0, DateTimeKind.Unspecified);
        return new DateTimeOffset(wallClock, NewYork.GetUtcOffset(wallClock));
    }

    [Fact]
    public void NewYork_2026Transitions_AreOnMarchEighthAndNovemberFirst()
    {
        // 02:30 does not exist on spring-forward night; 01:30 happens twice on fall-back night.
        Assert.True(NewYork.IsInvalidTime(new DateTime(2026, 3, 8, 2, 30, 0)));
        Assert.True(NewYork.IsAmbiguousTime(new DateTime(2026, 11, 1, 1, 30, 0)));
    }

    [Fact]
    public void Standing_SpringForwardNight_IsSixHoursNotSeven()
    {
        var lastUsed = Local(3, 7, 23, 0);
        var collected = Local(3, 8, 6, 0);
        Assert.True(At("2026-03-07T23:00:00-05:00").EqualsExact(lastUsed), lastUsed.ToString("o"));
        Assert.True(At("2026-03-08T06:00:00-04:00").EqualsExact(collected), collected.ToString("o"));

        var review = Review(KitKind.Water, FirstDraw(collected, lastUsed));

        Assert.Equal([TimeSpan.FromHours(6)], review.StandingTimes);
        Assert.Empty(review.Flags);
    }

    [Fact]
    public void Standing_FallBackNight_IsSixAndAHalfHoursNotFiveAndAHalf()
    {
        var lastUsed = Local(10, 31, 23, 30);
        var collected = Local(11, 1, 5, 0);
        Assert.True(At("2026-10-31T23:30:00-04:00").EqualsExact(lastUsed), lastUsed.ToString("o"));
        Assert.True(At("2026-11-01T05:00:00-05:00").EqualsExact(collected), collected.ToString("o"));

        var review = Review(KitKind.Water, FirstDraw(collected, lastUsed));

        Assert.Equal([new TimeSpan(6, 30, 0)], review.StandingTimes);
        Assert.Empty(review.Flags);
    }
}
