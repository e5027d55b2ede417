using System.Globalization;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Tests.Rules.Sampling;

/// <summary>Short builders for the bottles a household records, around one fixed morning.</summary>
internal static class Bottle
{
    public static readonly DateTimeOffset LastUsed = At("2026-04-02T23:00:00Z");
    public static readonly DateTimeOffset Morning = LastUsed.AddHours(8);
    public static readonly DateTimeOffset RecordedAt = Morning.AddDays(1);

    public static DateTimeOffset At(string text) => DateTimeOffset.Parse(text, CultureInfo.InvariantCulture);

    public static SampleEntry FirstDraw(DateTimeOffset collected, DateTimeOffset? lastUsed) =>
        new(BottleType.FirstDraw, null, null, collected, lastUsed, null);

    public static SampleEntry FifthLiter(DateTimeOffset collected, DateTimeOffset? lastUsed = null) =>
        new(BottleType.FifthLiter, null, null, collected, lastUsed, null);

    public static SampleEntry Flushed(DateTimeOffset collected, int? flushSeconds = 120) =>
        new(BottleType.Flushed, null, null, collected, null, flushSeconds);

    public static SampleEntry Sequential(int position, DateTimeOffset collected, DateTimeOffset? lastUsed = null) =>
        new(BottleType.Sequential, position, null, collected, lastUsed, null);

    public static SampleEntry Soil(SoilLocation location, DateTimeOffset collected) =>
        new(BottleType.Soil, null, location, collected, null, null);

    /// <summary>Reviewed with default limits, recorded a day after the last bottle (clock checks pass their own time).</summary>
    public static CollectionReview Review(KitKind kind, params SampleEntry[] samples) =>
        CollectionCheck.Review(kind, samples, samples.Max(s => s.CollectedAt).AddDays(1), new SamplingLimits());

    /// <summary>A water kit with one first-draw bottle, standing the given time.</summary>
    public static CollectionReview StoodFor(TimeSpan standing) =>
        Review(KitKind.Water, FirstDraw(LastUsed + standing, LastUsed));

    public static CollectionFlagCode[] Codes(CollectionReview review) => [.. review.Flags.Select(f => f.Code)];
}
