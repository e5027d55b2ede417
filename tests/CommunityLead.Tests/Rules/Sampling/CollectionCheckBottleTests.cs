using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using static CommunityLead.Tests.Rules.Sampling.Bottle;

namespace CommunityLead.Tests.Rules.Sampling;

public class CollectionCheckBottleTests
{
    [Fact]
    public void Water_FirstDrawThenFlushed_HasNoFlags()
    {
        var review = Review(KitKind.Water, FirstDraw(Morning, LastUsed), Flushed(Morning.AddMinutes(3)));
        Assert.Empty(review.Flags);
        Assert.True(review.IsValid);
    }

    [Fact]
    public void Water_FlushedBeforeFirstDraw_InvalidatesFlushedBottle()
    {
        var review = Review(KitKind.Water, FirstDraw(Morning, LastUsed), Flushed(Morning.AddMinutes(-3)));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.FlushedBeforeFirstDraw, FlagSeverity.InvalidatesSample, 1), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.False(review.IsValid);
    }

    [Fact]
    public void Water_FlushedWithoutFlushSeconds_IsWarning()
    {
        var review = Review(KitKind.Water, FirstDraw(Morning, LastUsed), Flushed(Morning.AddMinutes(3), flushSeconds: null));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.FlushTimeMissing, FlagSeverity.Warning, 1), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.True(review.IsValid);
    }

    [Fact]
    public void Water_NoFirstDrawBottle_IsMissingFirstDrawForWholeKit()
    {
        var review = Review(KitKind.Water, Flushed(Morning));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.MissingFirstDraw, FlagSeverity.InvalidatesSample, null), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.False(review.IsValid);
    }

    [Fact]
    public void Sequential_NoPositionOne_IsMissingFirstDraw()
    {
        var review = Review(KitKind.WaterSequential, Sequential(2, Morning, LastUsed), Sequential(3, Morning.AddMinutes(1), LastUsed));
        Assert.Contains(review.Flags, f => f.Code == CollectionFlagCode.MissingFirstDraw && f.SampleIndex is null);
        Assert.False(review.IsValid);
    }

    [Fact]
    public void Sequential_PositionsOneTwoFour_IsSequenceGapWarning()
    {
        var review = Review(KitKind.WaterSequential,
            Sequential(1, Morning, LastUsed), Sequential(2, Morning.AddMinutes(1)), Sequential(4, Morning.AddMinutes(2)));
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.SequenceGap, FlagSeverity.Warning, null), (flag.Code, flag.Severity, flag.SampleIndex));
        Assert.Contains("1, 2, 4", flag.Message);
        Assert.True(review.IsValid);
    }

    [Theory]
    [InlineData(BottleType.FirstDraw)]
    [InlineData(BottleType.Flushed)]
    public void Water_SameBottleTwice_IsDuplicateOnSecond(BottleType twice)
    {
        var extra = twice == BottleType.Flushed ? Flushed(Morning.AddMinutes(4)) : FirstDraw(Morning.AddMinutes(4), LastUsed);
        var review = Review(KitKind.Water, FirstDraw(Morning, LastUsed), Flushed(Morning.AddMinutes(3)), extra);
        var flag = Assert.Single(review.Flags);
        Assert.Equal((CollectionFlagCode.DuplicateBottle, FlagSeverity.Warning, 2), (flag.Code, flag.Severity, flag.SampleIndex));
    }

    [Fact]
    public void Sequential_SamePositionTwice_IsDuplicate()
    {
        var review = Review(KitKind.WaterSequential,
            Sequential(1, Morning, LastUsed), Sequential(2, Morning.AddMinutes(1)), Sequential(2, Morning.AddMinutes(2)));
        Assert.Equal([CollectionFlagCode.DuplicateBottle], Codes(review));
        Assert.Equal(2, review.Flags[0].SampleIndex);
    }

    [Fact]
    public void Soil_NoWaterBottles_GetsNoWaterFlags()
    {
        var review = Review(KitKind.Soil, Soil(SoilLocation.PlayArea, Morning), Soil(SoilLocation.DripLine, Morning.AddMinutes(10)));
        Assert.Empty(review.Flags);
        Assert.Equal([null, null], review.StandingTimes);
        Assert.True(review.IsValid);
    }

    [Fact]
    public void Soil_SameLocationTwice_IsDuplicate() =>
        Assert.Equal([CollectionFlagCode.DuplicateBottle],
            Codes(Review(KitKind.Soil, Soil(SoilLocation.Garden, Morning), Soil(SoilLocation.Garden, Morning.AddMinutes(5)))));
}
