namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>The program's own details printed on every letter; bound from the "Letters" configuration section.</summary>
/// <param name="WaterUtilityName">Named in "who to call" for homes on public water; never for private wells.</param>
public sealed record LetterSettings(
    string ProgramName, IReadOnlyList<string> ProgramAddress, string ProgramPhone, string? ProgramEmail, string? ProgramWebsite,
    string HealthDepartmentName, string HealthDepartmentPhone, string? WaterUtilityName, string? WaterUtilityPhone,
    PaperSize Paper = PaperSize.Letter);

/// <summary>Who the letter goes to, as printed in the envelope window.</summary>
public sealed record LetterRecipient(string Name, string Line1, string? Line2, string City, string? Region, string PostalCode);
