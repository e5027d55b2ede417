using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Data.Entities;

/// <summary>A signed-up home. Name, address, phone and email are personal data: coordinator eyes only.</summary>
public class Household
{
    public Guid Id { get; set; }
    public required string Name { get; set; }
    public required PostalAddress Address { get; set; }
    public string? Phone { get; set; }
    public string? Email { get; set; }
    public LetterLanguage Language { get; set; }
    public required string ConsentVersion { get; set; }
    public DateTimeOffset ConsentGivenAt { get; set; }
    public required string AreaCode { get; set; }
    public WaterSource WaterSource { get; set; }
    public int? YearBuilt { get; set; }
    public ServiceLineMaterial ServiceLine { get; set; }
    public bool ChildUnder6 { get; set; }
    public bool Pregnant { get; set; }
    public bool FilterInUse { get; set; }
    public DateTime CreatedAtUtc { get; set; }
    public DateTime UpdatedAtUtc { get; set; }

    /// <summary>Moves on with every change; sent as the ETag, so an edit based on an old read is refused.</summary>
    public int Version { get; set; } = 1;

    public List<Kit> Kits { get; set; } = [];
}

public class PostalAddress
{
    public required string Line1 { get; set; }
    public string? Line2 { get; set; }
    public required string City { get; set; }
    public string? Region { get; set; }
    public required string PostalCode { get; set; }
}
