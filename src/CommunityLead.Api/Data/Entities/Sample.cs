using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Data.Entities;

/// <summary>One bottle (or soil bag) as the household recorded it.</summary>
public class Sample
{
    public int Id { get; set; }
    public int CollectionId { get; set; }
    /// <summary>Order in which the sample was listed, so flags can point at it.</summary>
    public int Index { get; set; }
    public BottleType Bottle { get; set; }
    public int? Position { get; set; }
    public SoilLocation? Location { get; set; }
    public int? VolumeMl { get; set; }
    /// <summary>As written, with the household's offset.</summary>
    public DateTimeOffset CollectedAt { get; set; }
    /// <summary>The same instant in UTC, for sorting and period filters (SQLite can't compare offsets).</summary>
    public DateTime CollectedAtUtc { get; set; }
    public DateTimeOffset? WaterLastUsedAt { get; set; }
    public int? FlushSeconds { get; set; }
    public SampleTap? Tap { get; set; }
    /// <summary>The coordinator's words about the tap. Free text: never shown to the lab.</summary>
    public string? TapNote { get; set; }
    public int? StandingMinutes { get; set; }
}
