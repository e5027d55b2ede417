using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Kits;

/// <param name="IssuedAt">When the kit was handed out, if before it is entered here (kits given out at an event are often
/// typed in days later); now when left out. Collections and receipts dated before it are refused.</param>
public sealed record IssueKitRequest(Guid? HouseholdId, KitKind? Kind, DateTimeOffset? IssuedAt = null);

public sealed record CollectionRequest(IReadOnlyList<SampleRequest>? Samples);

public sealed record SampleRequest(
    BottleType? Bottle,
    int? Position,
    SoilLocation? Location,
    int? VolumeMl,
    DateTimeOffset? CollectedAt,
    DateTimeOffset? WaterLastUsedAt,
    int? FlushSeconds,
    SampleTap? Tap,
    string? TapNote = null);

public sealed record ReceiptRequest(DateTimeOffset? ReceivedAt, string? Note);

/// <summary>Body of cancel, lost and reject: someone will later ask why.</summary>
public sealed record ReasonRequest(string? Reason);

public sealed record ReplacementRequest(string? Reason);
