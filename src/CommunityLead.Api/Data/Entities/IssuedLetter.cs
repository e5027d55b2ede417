using CommunityLead.Api.Features.Letters;
using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// A letter as generated for a household: the exact content (JSON), the SHA-256 of its bytes, the
/// interpretation and profile version it came from, and — once confirmed — when it was sent. The content
/// is kept so the same letter can be rendered again, byte for byte, to show what the household was told.
/// </summary>
public class IssuedLetter
{
    public int Id { get; set; }
    public int KitId { get; set; }
    public required string KitCode { get; set; }
    public int InterpretationId { get; set; }
    public required string ProfileId { get; set; }
    public int ProfileVersion { get; set; }
    public LetterLanguage Language { get; set; }
    public LetterKind Kind { get; set; }
    public required string ContentJson { get; set; }
    public required string Sha256 { get; set; }
    public int Pages { get; set; }
    public DateTime IssuedAtUtc { get; set; }
    public required string IssuedBy { get; set; }
    /// <summary>The household's calendar day of collection, for the collection-to-letter figures.</summary>
    public DateOnly CollectedOn { get; set; }
    public DateTime? SentAtUtc { get; set; }
    public string? SentBy { get; set; }
    /// <summary>Days from collection to the confirmed sending (the LCRI asks utilities for 3 business days).</summary>
    public int? DaysFromCollection { get; set; }
    /// <summary>
    /// The wording catalogue version the letter was written with (messages and the letter's own words:
    /// WordingCatalogue.Version, the one `messages export` prints), so a medical advisor can see what was approved.
    /// </summary>
    public string? CatalogVersion { get; set; }
    /// <summary>
    /// For a result that needed a person first (urgent or implausible): the coordinator who checked it and called
    /// the household, and when. Null for letters that needed no release.
    /// </summary>
    public string? ReleasedBy { get; set; }
    public DateTime? ReleasedAtUtc { get; set; }
}
