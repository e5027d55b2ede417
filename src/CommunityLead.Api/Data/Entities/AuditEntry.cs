namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// Append-only record of every change: who (key label and role), when, what, from/to and why.
/// The database refuses updates and deletes on this table (see the migration's triggers).
/// Details name changed fields, never personal values, so the trail can be shown beyond the coordinator.
/// </summary>
public class AuditEntry
{
    public long Id { get; set; }
    public DateTime AtUtc { get; set; }
    public required string ActorLabel { get; set; }
    public required string ActorRole { get; set; }
    /// <summary>"kit", "household" or "key".</summary>
    public required string Subject { get; set; }
    public required string SubjectKey { get; set; }
    public required string Action { get; set; }
    public string? FromState { get; set; }
    public string? ToState { get; set; }
    public string? Reason { get; set; }
    public string? Detail { get; set; }
}
