namespace CommunityLead.Rules.Sampling;

/// <summary>One bottle as the household recorded it. Times keep the offset the household wrote down.</summary>
public sealed record SampleEntry(
    BottleType Bottle,
    int? Position,
    SoilLocation? Location,
    DateTimeOffset CollectedAt,
    DateTimeOffset? WaterLastUsedAt,
    int? FlushSeconds);

/// <param name="StandingTimes">Per sample, how long the water stood; null where it does not apply or is unknown.</param>
public sealed record CollectionReview(IReadOnlyList<TimeSpan?> StandingTimes, IReadOnlyList<CollectionFlag> Flags)
{
    public bool IsValid => Flags.All(f => f.Severity != FlagSeverity.InvalidatesSample);
}
