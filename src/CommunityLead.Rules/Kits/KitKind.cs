namespace CommunityLead.Rules.Kits;

public enum KitKind
{
    Water,
    /// <summary>Consecutive bottles of known volume, to locate where along the plumbing lead enters.</summary>
    WaterSequential,
    Soil,
}
