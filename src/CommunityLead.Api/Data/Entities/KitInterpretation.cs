using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// What a kit's results were judged to mean, with the profile id and version used. Stored whole (JSON) so a
/// later profile change never rewrites what the household was told; a new interpretation supersedes it.
/// </summary>
public class KitInterpretation
{
    public int Id { get; set; }
    public int KitId { get; set; }
    public required string KitCode { get; set; }
    public Band Band { get; set; }
    public required string ProfileId { get; set; }
    public int ProfileVersion { get; set; }
    public required string OutcomeJson { get; set; }
    public DateTime CreatedAtUtc { get; set; }
    public required string CreatedBy { get; set; }
    public DateTime? SupersededAtUtc { get; set; }
}
