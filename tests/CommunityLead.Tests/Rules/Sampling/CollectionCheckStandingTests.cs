using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Sampling.Bottle;

namespace CommunityLead.Tests.Rules.Sampling;

public class CollectionCheckStandingTests
{
    // Minimum: water unused "at least 6 hours" before a first draw (EPA homeowner tap-sample instructions, 2024).
    [Fact]
    public void Standing_ExactlySixHours_IsNotShort()
    {
        var review = StoodFor(TimeSpan.FromHours(6));
        Assert.Equal([TimeSpan.FromHours(6)], review.StandingTimes);
        Assert.Empty(review.Flags);
        Assert.True(review.IsValid);
    }

    [Fact]
    public void Standing_FiveHoursFiftyNine_IsShortAndInvalidates()
    {
        var review = StoodFor(new TimeSpan(5, 59, 0));
        Assert.Equal([new TimeSpan(5, 59, 0)], review.StandingTimes);
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.StandingTimeShort, FlagSeverity.InvalidatesSample, 0), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.Contains("stood 5 h 59 min; at least 6 h", flag.Message);
        Assert.False(review.IsValid);
    }

    // Maximum 18 h: common practice, not a federal rule (no federal maximum exists); a setting.
    [Fact]
    public void Standing_ExactlyEighteenHours_IsNotLong() => Assert.Empty(StoodFor(TimeSpan.FromHours(18)).Flags);

    [Fact]
    public void Standing_OverEighteenHours_IsLongWarningStillValid()
    {
        var review = StoodFor(new TimeSpan(18, 1, 0));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.StandingTimeLong, FlagSeverity.Warning, 0), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.Equal([new TimeSpan(18, 1, 0)], review.StandingTimes);
        Assert.True(review.IsValid);
    }

    [Fact]
    public void Standing_CustomMinimum_IsUsed()
    {
        var limits = new SamplingLimits { MinimumStanding = TimeSpan.FromHours(8) };
        var review = CollectionCheck.Review(KitKind.Water, [FirstDraw(LastUsed.AddHours(7), LastUsed)], RecordedAt, limits);
        Assert.Equal([CollectionFlagCode.StandingTimeShort], Codes(review));
    }

    [Fact]
    public void Standing_LastUseMissing_IsUnknownWarning()
    {
        var review = Review(KitKind.Water, FirstDraw(Morning, null));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.StandingTimeUnknown, FlagSeverity.Warning, 0), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.Equal([(TimeSpan?)null], review.StandingTimes);
    }

    [Fact]
    public void Standing_LastUseAfterCollection_IsFlaggedNotShort()
    {
        var review = Review(KitKind.Water, FirstDraw(Morning, Morning.AddMinutes(1)));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.WaterUsedAfterCollection, FlagSeverity.InvalidatesSample, 0), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.Equal([(TimeSpan?)null], review.StandingTimes);
        Assert.False(review.IsValid);
    }

    [Fact]
    public void Standing_LaterSequentialBottles_InheritBottleOnesLastUse()
    {
        var review = Review(KitKind.WaterSequential,
            Sequential(1, LastUsed.AddHours(7), LastUsed),
            Sequential(2, LastUsed.AddHours(7).AddMinutes(1)),
            Sequential(3, LastUsed.AddHours(7).AddMinutes(2)));
        Assert.Empty(review.Flags);
        Assert.Equal([TimeSpan.FromHours(7), new TimeSpan(7, 1, 0), new TimeSpan(7, 2, 0)], review.StandingTimes);
    }

    [Fact]
    public void Standing_BottleOneShort_LaterBottlesShortToo()
    {
        var review = Review(KitKind.WaterSequential,
            Sequential(2, LastUsed.AddHours(5).AddMinutes(1)),
            Sequential(1, LastUsed.AddHours(5), LastUsed));
        Assert.Equal([new TimeSpan(5, 1, 0), TimeSpan.FromHours(5)], review.StandingTimes);
        Assert.Equal([(CollectionFlagCode.StandingTimeShort, 0), (CollectionFlagCode.StandingTimeShort, 1)],
            review.Flags.Select(f => (f.Code, f.SampleIndex)));
    }

    [Fact]
    public void Standing_FifthLiterAndFlushed_ShareFirstDrawLastUseOnlyWhereStagnant()
    {
        var review = Review(KitKind.Water,
            FirstDraw(Morning, LastUsed), FifthLiter(Morning.AddMinutes(1)), Flushed(Morning.AddMinutes(5)));
        Assert.Empty(review.Flags);
        Assert.Equal([TimeSpan.FromHours(8), new TimeSpan(8, 1, 0), null], review.StandingTimes);
    }
}
