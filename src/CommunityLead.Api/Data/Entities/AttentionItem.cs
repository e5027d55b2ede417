using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// Something a person must do about a kit: call about an urgent result, arrange a retest, send a corrected
/// letter. Raised by interpretation or by a correction; resolved with a note, never deleted.
/// </summary>
public class AttentionItem
{
    /// <summary>What the Detail column holds; <c>AttentionText</c> keeps composed lines within it.</summary>
    public const int DetailMaxLength = 500;

    public int Id { get; set; }
    public int KitId { get; set; }
    public required string KitCode { get; set; }
    public AttentionFlag Reason { get; set; }
    /// <summary>The flag's rank, most urgent first (0), so the list sorts in the database.</summary>
    public int Priority { get; set; }
    public required string Detail { get; set; }
    public DateTime RaisedAtUtc { get; set; }
    public DateTime? ResolvedAtUtc { get; set; }
    public string? ResolvedBy { get; set; }
    public string? ResolutionNote { get; set; }
    /// <summary>
    /// The interpretation that raised it; null for items raised by a lab correction. The urgent and implausible
    /// items of a kit's current interpretation hold its letter back until resolved (LetterRelease).
    /// </summary>
    public int? InterpretationId { get; set; }
    public KitInterpretation? Interpretation { get; set; }

    /// <param name="interpretation">The interpretation raising it, saved in the same unit of work.</param>
    public static AttentionItem Raise(int kitId, string kitCode, AttentionFlag flag, string detail, DateTime nowUtc,
        KitInterpretation? interpretation = null) => new()
    {
        KitId = kitId, KitCode = kitCode, Reason = flag, Priority = (int)flag, Detail = detail, RaisedAtUtc = nowUtc,
        Interpretation = interpretation,
    };
}
