using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Sampling.Bottle;

namespace CommunityLead.Tests.Rules.Sampling;

public class CollectionCheckClockTests
{
    private static CollectionReview CollectedRelativeToRecording(TimeSpan ahead) =>
        CollectionCheck.Review(KitKind.Water, [FirstDraw(Morning, LastUsed)], Morning - ahead, new SamplingLimits());

    [Theory]
    [InlineData(0)]
    [InlineData(10)]
    [InlineData(15)]
    public void Clock_CollectedWithinToleranceAhead_IsNotFlagged(int minutesAhead) =>
        Assert.Empty(CollectedRelativeToRecording(TimeSpan.FromMinutes(minutesAhead)).Flags);

    [Theory]
    [InlineData(15 * 60 + 1)]
    [InlineData(24 * 3600)]
    public void Clock_CollectedBeyondToleranceAhead_IsCollectedInFuture(int secondsAhead)
    {
        var review = CollectedRelativeToRecording(TimeSpan.FromSeconds(secondsAhead));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.CollectedInFuture, FlagSeverity.InvalidatesSample, 0), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.False(review.IsValid);
    }

    [Fact]
    public void Clock_RecordedInOtherOffset_ComparesInstants()
    {
        // Collected 08:00 Eastern daylight time = 12:00 UTC; recorded 12:05 UTC, so it is not in the future
        // even though the wall-clock "12:05" of the recording and "08:00" differ by hours.
        var collected = At("2026-04-03T08:00:00-04:00");
        var review = CollectionCheck.Review(KitKind.Water, [FirstDraw(collected, collected.AddHours(-7))],
            At("2026-04-03T12:05:00+00:00"), new SamplingLimits { ClockTolerance = TimeSpan.Zero });
        Assert.Empty(review.Flags);
    }

    [Fact]
    public void Clock_SoilSampleInFuture_IsFlaggedToo()
    {
        var review = CollectionCheck.Review(KitKind.Soil, [Soil(SoilLocation.Yard, Morning.AddHours(2))], Morning, new SamplingLimits());
        Assert.Equal([CollectionFlagCode.CollectedInFuture], Codes(review));
    }
}
