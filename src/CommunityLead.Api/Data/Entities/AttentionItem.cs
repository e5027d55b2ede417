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

    public static AttentionItem Raise(int kitId, string kitCode, AttentionFlag flag, string detail, DateTime nowUtc) => new()
    {
        KitId = kitId, KitCode = kitCode, Reason = flag, Priority = (int)flag, Detail = detail, RaisedAtUtc = nowUtc,
    };
}
