using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Kits;

namespace CommunityLead.Api.Features.Households;

public sealed record HouseholdCreated(Guid Id);

public sealed record HouseholdResponse(
    Guid Id,
    string Name,
    AddressResponse Address,
    string? Phone,
    string? Email,
    LetterLanguage Language,
    string ConsentVersion,
    DateTimeOffset ConsentGivenAt,
    string AreaCode,
    WaterSource WaterSource,
    int? YearBuilt,
    ServiceLineMaterial ServiceLine,
    bool ChildUnder6,
    bool Pregnant,
    bool FilterInUse,
    DateTime CreatedAt,
    DateTime UpdatedAt,
    IReadOnlyList<HouseholdKit> Kits);

public sealed record AddressResponse(string Line1, string? Line2, string City, string? Region, string PostalCode);

public sealed record HouseholdKit(string Code, KitKind Kind, KitState State, DateTime IssuedAt);
