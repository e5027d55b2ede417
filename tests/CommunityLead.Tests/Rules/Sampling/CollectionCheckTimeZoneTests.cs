using CommunityLead.Rules.Kits;
using static CommunityLead.Tests.Rules.Sampling.Bottle;

namespace CommunityLead.Tests.Rules.Sampling;

/// <summary>Standing time is measured between absolute instants, whatever offsets the household wrote.</summary>
public class CollectionCheckTimeZoneTests
{
    [Theory]
    // 23:00 EDT = 03:00Z, collected 05:00Z: the wall clocks say 6 h, the water stood 2 h.
    [InlineData("2026-04-02T23:00:00-04:00", "2026-04-03T05:00:00+00:00", 120, 360, true)]
    // 01:00Z = 21:00 EDT, collected 05:00 EDT = 09:00Z: the wall clocks say 4 h, the water stood 8 h.
    [InlineData("2026-04-03T01:00:00+00:00", "2026-04-03T05:00:00-04:00", 480, 240, false)]
    // US Eastern spring-forward 2026-03-08 02:00 EST → 03:00 EDT: wall clock 7 h, true 6 h (exactly the minimum).
    [InlineData("2026-03-07T23:00:00-05:00", "2026-03-08T06:00:00-04:00", 360, 420, false)]
    // Fall-back 2026-11-01 02:00 EDT → 01:00 EST: wall clock 5 h 30 min, true 6 h 30 min.
    [InlineData("2026-10-31T23:30:00-04:00", "2026-11-01T05:00:00-05:00", 390, 330, false)]
    public void Standing_MixedOffsets_UsesAbsoluteInstants(string lastUsedText, string collectedText,
        int trueMinutes, int wallClockMinutes, bool isShort)
    {
        var lastUsed = At(lastUsedText);
        var collected = At(collectedText);
        // The trap the rule must avoid: subtracting the written clock times without their offsets.
        Assert.Equal(TimeSpan.FromMinutes(wallClockMinutes), collected.DateTime - lastUsed.DateTime);

        var review = Review(KitKind.Water, FirstDraw(collected, lastUsed));

        Assert.Equal([TimeSpan.FromMinutes(trueMinutes)], review.StandingTimes);
        Assert.Equal(isShort, Codes(review).Contains(CommunityLead.Rules.Sampling.CollectionFlagCode.StandingTimeShort));
        Assert.Equal(!isShort, review.IsValid);
    }
}
