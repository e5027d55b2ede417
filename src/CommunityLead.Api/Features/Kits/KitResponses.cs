using System.Text.Json.Serialization;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Kits;

public sealed record KitIssued(string Code, KitState State, Guid HouseholdId);

/// <summary>
/// One kit. The lab gets the same shape without <see cref="HouseholdId"/>, <see cref="History"/> (history reasons
/// are free text and may name people), the replacement links (they tie a household's kits together) and the tap
/// notes, so those are left out when null.
/// </summary>
public sealed record KitResponse(
    string Code,
    KitKind Kind,
    KitState State,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] Guid? HouseholdId,
    DateTime IssuedAt,
    DateTimeOffset? ReceivedAt,
    string? StateReason,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] string? ReplacesCode,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] string? ReplacedByCode,
    IReadOnlyList<SampleResponse> Samples,
    IReadOnlyList<FlagResponse> Flags,
    IReadOnlyList<KitAction> AllowedActions,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] IReadOnlyList<HistoryEntry>? History);

public sealed record SampleResponse(
    BottleType Bottle,
    int? Position,
    SoilLocation? Location,
    int? VolumeMl,
    DateTimeOffset CollectedAt,
    DateTimeOffset? WaterLastUsedAt,
    int? FlushSeconds,
    SampleTap? Tap,
    int? StandingMinutes,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] string? TapNote = null);

public sealed record FlagResponse(
    CollectionFlagCode Code, FlagSeverity Severity, BottleType? Bottle, int? Position, string Message);

public sealed record HistoryEntry(
    DateTime At, string Actor, string Role, string Action, string? From, string? To, string? Reason, string? Detail);

public sealed record KitSummary(
    string Code, KitKind Kind, KitState State, Guid HouseholdId, string AreaCode, DateTime IssuedAt, DateTime UpdatedAt, int FlagCount);

public sealed record KitPage(IReadOnlyList<KitSummary> Items, int Page, int PageSize, int Total);
