using CommunityLead.Api.Features.Areas;
using CommunityLead.Api.Features.Households;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Rules.Kits;

namespace CommunityLead.Api.Demo;

/// <summary>The shape of seed-data/demo.json: an invented program, its households and their kits.</summary>
/// <param name="LettersSent">Kits whose letter is issued and confirmed sent once their results are interpreted.</param>
/// <param name="Areas">The program's areas, added before the households that name them.</param>
public sealed record DemoScenario(DemoProgram Program, IReadOnlyList<DemoHousehold> Households, IReadOnlyList<string>? LettersSent = null,
    IReadOnlyList<NewAreaRequest>? Areas = null);

public sealed record DemoProgram(string Name, string Town, string Note);

/// <summary>A fixed id per household, so loading twice finds what is already there.</summary>
public sealed record DemoHousehold(Guid Id, HouseholdRequest Household, IReadOnlyList<DemoKit> Kits);

public sealed record DemoKit(
    string Code,
    KitKind Kind,
    DateTimeOffset IssuedAt,
    DemoCollection? Collection,
    DateTimeOffset? ReceivedAt,
    DemoFinalMove? Then,
    string? Replaces);

public sealed record DemoCollection(DateTimeOffset RecordedAt, IReadOnlyList<SampleRequest> Samples);

/// <summary>cancel, lost or reject, with its reason.</summary>
public sealed record DemoFinalMove(string Action, string Reason);
