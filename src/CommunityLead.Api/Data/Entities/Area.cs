namespace CommunityLead.Api.Data.Entities;

/// <summary>
/// A part of the program's territory that reports group by. A managed list, so a typo ("harbor" for "harbour")
/// cannot split a group: households may only name an active area. Deactivated areas keep their households.
/// </summary>
public class Area
{
    public required string Code { get; set; }
    public required string Name { get; set; }
    public bool Active { get; set; } = true;
}
