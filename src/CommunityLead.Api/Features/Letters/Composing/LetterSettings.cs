namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>The program's own details printed on every letter; bound from the "Letters" configuration section.</summary>
/// <param name="WaterUtilityName">Named in "who to call" for homes on public water; never for private wells.</param>
/// <param name="StaffName">Who signs every letter, e.g. the program coordinator; without one, the program's team signs.</param>
/// <param name="StaffTitle">The signer's title under the name; <paramref name="StaffTitleEs"/> in Spanish letters (this one if unset).</param>
public sealed record LetterSettings(
    string ProgramName, IReadOnlyList<string> ProgramAddress, string ProgramPhone, string? ProgramEmail, string? ProgramWebsite,
    string HealthDepartmentName, string HealthDepartmentPhone, string? WaterUtilityName, string? WaterUtilityPhone,
    PaperSize Paper = PaperSize.Letter, string? StaffName = null, string? StaffTitle = null, string? StaffTitleEs = null);

/// <summary>Who the letter goes to, as printed in the envelope window.</summary>
public sealed record LetterRecipient(string Name, string Line1, string? Line2, string City, string? Region, string PostalCode);
