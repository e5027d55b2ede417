using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Data;
using static CommunityLead.Tests.Rules.Sampling.Bottle;

namespace CommunityLead.Tests.Rules.Sampling;

/// <summary>
/// Flag messages are stored as worded (KitFlag.Message), so the longest wording must fit the column. The reviews
/// below raise every flag with the largest numbers a time or a setting can give and positions 1 to 30, the most
/// the collection validator lets through.
/// </summary>
public class CollectionFlagMessageLengthTests
{
    private static readonly DateTimeOffset Earliest = DateTimeOffset.MinValue;
    private static readonly DateTimeOffset Latest = DateTimeOffset.MaxValue;

    [Fact]
    public void Flags_WorstCaseWording_FitsTheMessageColumn()
    {
        var limit = StoreModel.MaxLength("KitFlag.Message");
        // No bottle 1 (a gap before 29 positions), each bottle standing the longest time there is, against the
        // largest minimum; recorded before it was collected; bottle 30 twice.
        SampleEntry[] sequence = [.. Enumerable.Range(2, 29).Select(p => Sequential(p, Latest, Earliest)), Sequential(30, Latest, Earliest)];
        var shortAndGaps = CollectionCheck.Review(KitKind.WaterSequential, sequence, Earliest,
            new SamplingLimits { MinimumStanding = TimeSpan.MaxValue, ClockTolerance = TimeSpan.Zero });
        var tooLong = CollectionCheck.Review(KitKind.WaterSequential, [Sequential(30, Latest, Earliest)], Latest,
            new SamplingLimits { MaximumStanding = (Latest - Earliest) - TimeSpan.FromMinutes(1), ClockTolerance = TimeSpan.Zero });
        var water = Review(KitKind.Water, FirstDraw(Morning, null), FifthLiter(Morning, Morning.AddHours(1)), Flushed(Morning.AddHours(-1), null));
        var soil = CollectionCheck.Review(KitKind.Soil, [Soil(SoilLocation.PlayArea, Latest), Soil(SoilLocation.PlayArea, Latest)], Earliest,
            new SamplingLimits());

        var flags = new[] { shortAndGaps, tooLong, water, soil }.SelectMany(r => r.Flags)
            .Concat(CollectionCheck.BeforeIssue("7KQ4-M2XD-H", Latest, [Earliest])).ToList();

        Assert.Equal(Enum.GetValues<CollectionFlagCode>().Order(), flags.Select(f => f.Code).Distinct().Order());
        Assert.All(flags, f => Assert.True(f.Message.Length <= limit, $"{f.Message.Length} characters: {f.Message}"));
    }
}
