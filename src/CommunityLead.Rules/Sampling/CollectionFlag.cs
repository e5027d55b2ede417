namespace CommunityLead.Rules.Sampling;

public enum CollectionFlagCode
{
    StandingTimeShort,
    StandingTimeLong,
    StandingTimeUnknown,
    WaterUsedAfterCollection,
    CollectedInFuture,
    FlushedBeforeFirstDraw,
    MissingFirstDraw,
    DuplicateBottle,
    SequenceGap,
    FlushTimeMissing,
    CollectedBeforeIssue,
}

public enum FlagSeverity
{
    /// <summary>Worth a look; the result can still be interpreted.</summary>
    Warning,
    /// <summary>The sample does not show what a first draw should show; the household should resample.</summary>
    InvalidatesSample,
}

/// <param name="SampleIndex">Index of the sample in the recorded collection, or null for the kit as a whole.</param>
public sealed record CollectionFlag(CollectionFlagCode Code, FlagSeverity Severity, int? SampleIndex, string Message);
