namespace CommunityLead.Rules.Households;

public enum WaterSource
{
    Public,
    PrivateWell,
}

/// <summary>Material of the pipe from the water main to the home, as far as the household or utility knows.</summary>
public enum ServiceLineMaterial
{
    Unknown,
    Lead,
    Galvanized,
    Copper,
    Plastic,
}

/// <summary>Languages the program writes letters in.</summary>
public enum LetterLanguage
{
    En,
    Es,
}
