using System.Text.Json.Serialization;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Features.Households;

/// <summary>
/// Sign-up and update body. Everything is nullable so a missing field is named by the validator; read field by
/// field, so every field of the wrong type or value is named in the same answer.
/// </summary>
public sealed record HouseholdRequest(
    string? Name,
    AddressRequest? Address,
    string? Phone,
    string? Email,
    LetterLanguage? Language,
    string? ConsentVersion,
    DateTimeOffset? ConsentGivenAt,
    string? AreaCode,
    WaterSource? WaterSource,
    int? YearBuilt,
    ServiceLineMaterial? ServiceLine,
    bool? ChildUnder6,
    bool? Pregnant,
    bool? FilterInUse) : IReadFieldByField
{
    /// <inheritdoc />
    [JsonIgnore]
    public IReadOnlyDictionary<string, string[]>? ReadProblems { get; set; }
}

public sealed record AddressRequest(string? Line1, string? Line2, string? City, string? Region, string? PostalCode);
