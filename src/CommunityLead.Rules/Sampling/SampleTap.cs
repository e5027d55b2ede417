namespace CommunityLead.Rules.Sampling;

/// <summary>
/// The tap a bottle was filled at, from a closed list. The lab sees it; the coordinator's free-text note beside it
/// (a tap "behind the bar") stays with the coordinator, because free text is where names and phone numbers slip in.
/// Drinking-water sampling instructions ask for the kitchen or a bathroom cold tap (common practice).
/// </summary>
public enum SampleTap
{
    Kitchen,
    Bathroom,
    Laundry,
    Other,
}
