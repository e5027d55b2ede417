namespace CommunityLead.Api.Data.Entities;

public enum AttentionReason
{
    /// <summary>The lab corrected a result after the household's letter went out: a new letter is needed.</summary>
    CorrectedAfterLetter,
}

/// <summary>Something a person must do about a kit. Resolved, never deleted.</summary>
public class AttentionItem
{
    public int Id { get; set; }
    public int KitId { get; set; }
    public required string KitCode { get; set; }
    public AttentionReason Reason { get; set; }
    public required string Detail { get; set; }
    public DateTime RaisedAtUtc { get; set; }
    public DateTime? ResolvedAtUtc { get; set; }
}
