using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Data.Entities;

/// <summary>Something wrong with a collection that the household could not see; stored as raised at the time.</summary>
public class KitFlag
{
    public int Id { get; set; }
    public int CollectionId { get; set; }
    public CollectionFlagCode Code { get; set; }
    public FlagSeverity Severity { get; set; }
    public int? SampleIndex { get; set; }
    public required string Message { get; set; }
}
