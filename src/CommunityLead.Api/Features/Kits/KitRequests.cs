using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Kits;

public sealed record IssueKitRequest(Guid? HouseholdId, KitKind? Kind);

public sealed record CollectionRequest(IReadOnlyList<SampleRequest>? Samples);

public sealed record SampleRequest(
    BottleType? Bottle,
    int? Position,
    SoilLocation? Location,
    int? VolumeMl,
    DateTimeOffset? CollectedAt,
    DateTimeOffset? WaterLastUsedAt,
    int? FlushSeconds,
    string? Tap);

public sealed record ReceiptRequest(DateTimeOffset? ReceivedAt, string? Note);

/// <summary>Body of cancel, lost and reject: someone will later ask why.</summary>
public sealed record ReasonRequest(string? Reason);

public sealed record ReplacementRequest(string? Reason);
