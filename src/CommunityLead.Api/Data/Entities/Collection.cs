namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// One recording of a kit's bottles. Recording again supersedes, never deletes, so what was first typed
/// in stays visible.
/// </summary>
public class Collection
{
    public int Id { get; set; }
    public int KitId { get; set; }
    public DateTime RecordedAtUtc { get; set; }
    public required string RecordedBy { get; set; }
    public DateTime? SupersededAtUtc { get; set; }
    public List<Sample> Samples { get; set; } = [];
    public List<KitFlag> Flags { get; set; } = [];
}
