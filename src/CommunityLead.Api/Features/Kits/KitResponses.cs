using System.Text.Json.Serialization;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Kits;

public sealed record KitIssued(string Code, KitState State, Guid HouseholdId);

/// <summary>
/// One kit. The lab gets the same shape without <see cref="HouseholdId"/> and <see cref="History"/>
/// (history reasons are free text and may name people), so those are left out when null.
/// </summary>
public sealed record KitResponse(
    string Code,
    KitKind Kind,
    KitState State,
    [property: JsonIgnore(Condition = JsonIgnoreCondition.WhenWritingNull)] Guid? HouseholdId,
    DateTime IssuedAt,
    DateTimeOffset? ReceivedAt,
    string? StateReason,
    string? ReplacesCode,
    string? ReplacedByCode,
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
    string? Tap,
    int? StandingMinutes);

public sealed record FlagResponse(
    CollectionFlagCode Code, FlagSeverity Severity, BottleType? Bottle, int? Position, string Message);

public sealed record HistoryEntry(
    DateTime At, string Actor, string Role, string Action, string? From, string? To, string? Reason, string? Detail);

public sealed record KitSummary(
    string Code, KitKind Kind, KitState State, Guid HouseholdId, string AreaCode, DateTime IssuedAt, DateTime UpdatedAt, int FlagCount);

public sealed record KitPage(IReadOnlyList<KitSummary> Items, int Page, int PageSize, int Total);
