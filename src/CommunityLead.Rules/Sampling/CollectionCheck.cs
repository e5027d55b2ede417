using CommunityLead.Rules.Kits;

namespace CommunityLead.Rules.Sampling;

/// <summary>
/// Reviews a kit's collection for what the household cannot see for itself. It never rejects: every sample
/// is kept and the flags say what is wrong, so the coordinator can decide whether to ask for a new sample.
/// </summary>
public static class CollectionCheck
{
    /// <summary>
    /// Bottles dated before their kit was issued: kept (a kit entered after hand-out carries the date it was typed
    /// in), flagged so the coordinator checks the date. <paramref name="issued"/> is shown as given.
    /// </summary>
    public static IEnumerable<CollectionFlag> BeforeIssue(string kitCode, DateTimeOffset issued, IReadOnlyList<DateTimeOffset> collected)
    {
        for (var i = 0; i < collected.Count; i++)
            if (collected[i] < issued)
                yield return new CollectionFlag(CollectionFlagCode.CollectedBeforeIssue, FlagSeverity.Warning, i,
                    $"Dated before kit {kitCode} was issued ({issued.UtcDateTime.ToString("yyyy-MM-dd HH:mm", System.Globalization.CultureInfo.InvariantCulture)} UTC): " +
                    "check the date; standing and holding times use it as given.");
    }

    public static CollectionReview Review(
        KitKind kind, IReadOnlyList<SampleEntry> samples, DateTimeOffset recordedAt, SamplingLimits limits)
    {
        var flags = new List<CollectionFlag>();
        var standing = new TimeSpan?[samples.Count];
        if (kind != KitKind.Soil)
        {
            var firstDrawIndex = FindFirstDraw(kind, samples);
            if (firstDrawIndex is null)
                flags.Add(new(CollectionFlagCode.MissingFirstDraw, FlagSeverity.InvalidatesSample, null,
                    kind == KitKind.WaterSequential
                        ? "No sequential bottle 1 was recorded, so there is no first-draw sample."
                        : "No first-draw bottle was recorded."));
            ReviewStanding(samples, firstDrawIndex, limits, standing, flags);
            ReviewFlushed(samples, firstDrawIndex, flags);
            if (kind == KitKind.WaterSequential) ReviewSequence(samples, flags);
        }
        ReviewClock(samples, recordedAt, limits, flags);
        ReviewDuplicates(samples, flags);
        return new CollectionReview(standing, flags);
    }

    private static int? FindFirstDraw(KitKind kind, IReadOnlyList<SampleEntry> samples)
    {
        for (var i = 0; i < samples.Count; i++)
        {
            var s = samples[i];
            if (kind == KitKind.Water && s.Bottle == BottleType.FirstDraw) return i;
            if (kind == KitKind.WaterSequential && s.Bottle == BottleType.Sequential && s.Position == 1) return i;
        }
        return null;
    }

    private static void ReviewStanding(IReadOnlyList<SampleEntry> samples, int? firstDrawIndex,
        SamplingLimits limits, TimeSpan?[] standing, List<CollectionFlag> flags)
    {
        // Later bottles of the same draw share the first draw's standing period when they don't state their own.
        var sharedLastUse = firstDrawIndex is { } f ? samples[f].WaterLastUsedAt : null;
        for (var i = 0; i < samples.Count; i++)
        {
            var s = samples[i];
            if (!Bottles.IsStagnant(s.Bottle)) continue;
            var lastUse = s.WaterLastUsedAt ?? sharedLastUse;
            var name = Describe(s);
            if (lastUse is null)
            {
                flags.Add(new(CollectionFlagCode.StandingTimeUnknown, FlagSeverity.Warning, i,
                    $"The {name} has no time the water was last used, so its standing time is unknown."));
                continue;
            }
            // DateTimeOffset subtraction works on absolute instants, so offsets and clock changes cancel out.
            var stood = s.CollectedAt - lastUse.Value;
            if (stood < TimeSpan.Zero)
            {
                flags.Add(new(CollectionFlagCode.WaterUsedAfterCollection, FlagSeverity.InvalidatesSample, i,
                    $"The {name} was recorded as collected before the water was last used."));
                continue;
            }
            standing[i] = stood;
            if (stood < limits.MinimumStanding)
                flags.Add(new(CollectionFlagCode.StandingTimeShort, FlagSeverity.InvalidatesSample, i,
                    $"Water for the {name} stood {Hours(stood)}; at least {Hours(limits.MinimumStanding)} is needed."));
            else if (stood > limits.MaximumStanding)
                flags.Add(new(CollectionFlagCode.StandingTimeLong, FlagSeverity.Warning, i,
                    $"Water for the {name} stood {Hours(stood)}, longer than {Hours(limits.MaximumStanding)}; lead may read higher than in daily use."));
        }
    }

    private static void ReviewFlushed(IReadOnlyList<SampleEntry> samples, int? firstDrawIndex, List<CollectionFlag> flags)
    {
        for (var i = 0; i < samples.Count; i++)
        {
            var s = samples[i];
            if (s.Bottle != BottleType.Flushed) continue;
            if (s.FlushSeconds is null)
                flags.Add(new(CollectionFlagCode.FlushTimeMissing, FlagSeverity.Warning, i,
                    "The flushed bottle does not say how long the tap ran."));
            if (firstDrawIndex is { } f && s.CollectedAt < samples[f].CollectedAt)
                flags.Add(new(CollectionFlagCode.FlushedBeforeFirstDraw, FlagSeverity.InvalidatesSample, i,
                    "The flushed bottle was collected before the first draw, so the first draw was not from standing water."));
        }
    }

    private static void ReviewSequence(IReadOnlyList<SampleEntry> samples, List<CollectionFlag> flags)
    {
        var positions = samples.Where(s => s.Bottle == BottleType.Sequential && s.Position is not null)
            .Select(s => s.Position!.Value).Distinct().Order().ToList();
        if (positions.Count > 0 && positions[^1] != positions.Count)
            flags.Add(new(CollectionFlagCode.SequenceGap, FlagSeverity.Warning, null,
                $"Sequential bottles {string.Join(", ", positions)} were recorded; some positions are missing."));
    }

    private static void ReviewClock(IReadOnlyList<SampleEntry> samples, DateTimeOffset recordedAt,
        SamplingLimits limits, List<CollectionFlag> flags)
    {
        for (var i = 0; i < samples.Count; i++)
            if (samples[i].CollectedAt > recordedAt + limits.ClockTolerance)
                flags.Add(new(CollectionFlagCode.CollectedInFuture, FlagSeverity.InvalidatesSample, i,
                    $"The {Describe(samples[i])} is dated after it was recorded here; the date or time is probably wrong."));
    }

    private static void ReviewDuplicates(IReadOnlyList<SampleEntry> samples, List<CollectionFlag> flags)
    {
        var seen = new HashSet<(BottleType, int?, SoilLocation?)>();
        for (var i = 0; i < samples.Count; i++)
        {
            var s = samples[i];
            if (!seen.Add((s.Bottle, s.Position, s.Location)))
                flags.Add(new(CollectionFlagCode.DuplicateBottle, FlagSeverity.Warning, i,
                    $"The {Describe(s)} was recorded more than once; the lab cannot tell the bottles apart."));
        }
    }

    private static string Describe(SampleEntry s) => s.Bottle switch
    {
        BottleType.FirstDraw => "first-draw bottle",
        BottleType.Flushed => "flushed bottle",
        BottleType.FifthLiter => "fifth-liter bottle",
        BottleType.Sequential => $"sequential bottle {s.Position}",
        _ => s.Location switch
        {
            SoilLocation.PlayArea => "play-area soil sample",
            SoilLocation.Garden => "garden soil sample",
            SoilLocation.DripLine => "drip-line soil sample",
            _ => "yard soil sample",
        },
    };

    private static string Hours(TimeSpan t) =>
        t.Minutes == 0 ? $"{(int)t.TotalHours} h" : $"{(int)t.TotalHours} h {t.Minutes} min";
}
