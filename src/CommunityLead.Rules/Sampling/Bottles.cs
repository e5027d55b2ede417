using CommunityLead.Rules.Kits;

namespace CommunityLead.Rules.Sampling;

public enum BottleType
{
    /// <summary>The first liter from a cold tap after the water stood unused.</summary>
    FirstDraw,
    /// <summary>Taken after the tap ran, to compare with the first draw.</summary>
    Flushed,
    /// <summary>One of consecutive bottles of a profile; <c>position</c> counts from 1.</summary>
    Sequential,
    /// <summary>The fifth liter after standing, for homes with a lead service line.</summary>
    FifthLiter,
    Soil,
}

public enum SoilLocation
{
    PlayArea,
    Garden,
    DripLine,
    Yard,
}

public static class Bottles
{
    /// <summary>Bottles drawn from water that stood in the pipes, so their standing time matters.</summary>
    public static bool IsStagnant(BottleType bottle) =>
        bottle is BottleType.FirstDraw or BottleType.FifthLiter or BottleType.Sequential;

    public static bool FitsKit(KitKind kind, BottleType bottle) => kind switch
    {
        KitKind.Water => bottle is BottleType.FirstDraw or BottleType.Flushed or BottleType.FifthLiter,
        KitKind.WaterSequential => bottle is BottleType.Sequential or BottleType.Flushed,
        KitKind.Soil => bottle is BottleType.Soil,
        _ => false,
    };
}
