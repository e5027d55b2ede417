using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// Result bands, least to most serious; Retest stands apart (the sample can't be trusted, whatever it shows).
/// A value equal to a level is "at or above" it.
/// </summary>
public enum Band
{
    NotDetected,
    Low,
    Advisory,
    Action,
    Urgent,
    Retest,
}

public enum SourcePattern
{
    /// <summary>High first draw, low after flushing: the faucet or nearby plumbing.</summary>
    FaucetOrNearbyPlumbing,
    /// <summary>As high or higher after flushing: the service line or pipes further out.</summary>
    ServiceLineOrFurther,
    /// <summary>Both low: no sign of a lead source at this tap.</summary>
    NoSourceAtThisTap,
}

public enum SoilComparison { Below, Inconclusive, Above }

public enum AttentionFlag
{
    // Declared most urgent first: the attention list sorts on this order.
    Urgent,
    /// <summary>A result no tap or yard is likely to hold (a unit mix-up, swapped bottles): checked before any letter.</summary>
    Implausible,
    ActionLevelVulnerableHome,
    ActionLevel,
    SuspectedServiceLine,
    RetestNeeded,
    CorrectedAfterLetter,
    /// <summary>Results came in for a kit whose collection form was never recorded: they wait for it.</summary>
    AwaitingCollection,
}

/// <param name="LevelValue">The level the value was compared with, in <paramref name="Unit"/>; null when none applies.</param>
/// <param name="ScreeningLevel">Soil: <paramref name="LevelValue"/> is a screening level, not a hazard standard.</param>
/// <param name="HazardLevel">Soil: the hazard standard for the sample's place, also when the screening level decided
/// (so a letter's scale can show both); null for water and where the profile has no hazard standard.</param>
public sealed record Finding(
    BottleType Bottle,
    int? Position,
    SoilLocation? Location,
    Analyte Analyte,
    double Value,
    string Unit,
    bool BelowReportingLimit,
    Band Band,
    double? LevelValue,
    string? LevelMeaning,
    SoilComparison? Soil = null,
    bool ScreeningLevel = false,
    double? HazardLevel = null);

/// <summary>Where lead peaked in a sequential profile, and the length of pipe that much water fills.</summary>
public sealed record SequentialPeak(int Position, double PeakValue, double LitresBeforePeak, double PipeMetres);

/// <summary>One piece of plain-language text, in English and Spanish, for the household's letter and the coordinator.</summary>
public sealed record Message(string Code, string En, string Es);

public sealed record Interpretation(
    Band Band,
    string ProfileId,
    int ProfileVersion,
    IReadOnlyList<Finding> Findings,
    SourcePattern? Pattern,
    SequentialPeak? Peak,
    IReadOnlyList<ValidityIssue> Validity,
    IReadOnlyList<Message> Messages,
    IReadOnlyList<AttentionFlag> Flags)
{
    /// <summary>
    /// Results to check with the lab before any letter, and why. Not a constructor parameter, so interpretations
    /// stored before the check existed read back with none.
    /// </summary>
    public IReadOnlyList<ImplausibleResult> Implausible { get; init; } = [];
}
