using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>Who the letter is from, who it goes to, and who to call.</summary>
internal static class Contacts
{
    public static ProgramBlock Program(LetterSettings settings, LetterLanguage language)
    {
        List<string> contact = [$"{LetterWords.Phone.In(language)}: {settings.ProgramPhone}"];
        if (!string.IsNullOrWhiteSpace(settings.ProgramEmail)) contact.Add($"{LetterWords.Email.In(language)}: {settings.ProgramEmail}");
        if (!string.IsNullOrWhiteSpace(settings.ProgramWebsite)) contact.Add(settings.ProgramWebsite);
        return new ProgramBlock(settings.ProgramName, settings.ProgramAddress, contact);
    }

    /// <summary>The staff member named in the settings signs, with their title in the letter's language; else the program's team.</summary>
    public static LetterSignature Signature(LetterSettings settings, LetterLanguage language)
    {
        var signOff = LetterWords.SignOff.In(language);
        if (string.IsNullOrWhiteSpace(settings.StaffName))
            return new LetterSignature(signOff, LetterWords.Team(settings.ProgramName).In(language), null);
        var title = language == LetterLanguage.Es && !string.IsNullOrWhiteSpace(settings.StaffTitleEs) ? settings.StaffTitleEs : settings.StaffTitle;
        return new LetterSignature(signOff, settings.StaffName.Trim(), string.IsNullOrWhiteSpace(title) ? null : title.Trim());
    }

    /// <summary>US order for the envelope window: name, street lines, then "City, Region Postal code".</summary>
    public static IReadOnlyList<string> Recipient(LetterRecipient to)
    {
        var place = string.IsNullOrWhiteSpace(to.Region) ? to.City : $"{to.City}, {to.Region}";
        return [.. new[] { to.Name, to.Line1, to.Line2, $"{place} {to.PostalCode}" }.Where(l => !string.IsNullOrWhiteSpace(l)).Select(l => l!.Trim())];
    }

    /// <summary>
    /// The health department always; the water utility for a home on public water (a well has none, so well owners
    /// are sent to the health department about their well); a doctor where a child under 6 lives or someone is
    /// pregnant; and the program itself for questions about the letter. Sentences are short on purpose: the
    /// reading-level formula counts every digit of a phone number as a syllable.
    /// </summary>
    /// <param name="soil">A soil letter sends people to the health department about soil, never to the water utility.</param>
    public static IReadOnlyList<string> WhoToCall(LetterSettings s, LetterLanguage language, bool privateWell, bool childOrPregnancy, bool soil = false)
    {
        var calls = new List<Phrase> { soil ? CallHealthAboutSoil(s) : privateWell ? CallHealthAboutWell(s) : CallHealth(s) };
        if (!soil && !privateWell && !string.IsNullOrWhiteSpace(s.WaterUtilityName) && !string.IsNullOrWhiteSpace(s.WaterUtilityPhone))
            calls.Add(CallUtility(s));
        if (childOrPregnancy) calls.Add(CallDoctor);
        calls.Add(CallUs(s));
        return [.. calls.Select(c => c.In(language))];
    }

    // Each line on its own, so the reviewable wording catalogue (LetterPhrases) can list it.
    internal static Phrase CallHealth(LetterSettings s) =>
        new($"Call {s.HealthDepartmentName} at {s.HealthDepartmentPhone}. Ask them about lead and your health. They can tell you what to do next.",
            $"Llame a {s.HealthDepartmentName} al {s.HealthDepartmentPhone}. Ahí pueden responder sus preguntas sobre el plomo y su salud, y decirle qué hacer.");

    internal static Phrase CallHealthAboutSoil(LetterSettings s) =>
        new($"Call {s.HealthDepartmentName} at {s.HealthDepartmentPhone}. Ask them about lead in soil and your health. They can tell you what to do next.",
            $"Llame a {s.HealthDepartmentName} al {s.HealthDepartmentPhone}. Ahí pueden responder sus preguntas sobre el plomo en la tierra y su salud, y decirle qué hacer.");

    internal static Phrase CallHealthAboutWell(LetterSettings s) =>
        new($"Call {s.HealthDepartmentName} at {s.HealthDepartmentPhone}. Ask them about lead and your health. They can also tell you how to test and treat your well water.",
            $"Llame a {s.HealthDepartmentName} al {s.HealthDepartmentPhone}. Ahí pueden responder sus preguntas sobre el plomo y su salud, y explicarle cómo analizar y tratar el agua de su pozo.");

    // Water systems keep a public inventory of service-line materials [memory: 40 CFR 141.84(a), added in 2021].
    internal static Phrase CallUtility(LetterSettings s) =>
        new($"Call {s.WaterUtilityName} at {s.WaterUtilityPhone}. Ask them if the pipe from the street to your home is lead. They keep a list of these pipes.",
            $"Llame a {s.WaterUtilityName} al {s.WaterUtilityPhone}. Pregunte si el tubo que trae el agua de la calle a su casa es de plomo. Ellos llevan un registro de estas tuberías.");

    internal static readonly Phrase CallDoctor = new("Call your doctor, or your child's doctor. Ask if a blood lead test is needed.",
        "Llame a su médico o al médico de su niño o niña. Pregunte si hace falta un análisis de plomo en la sangre.");

    internal static Phrase CallUs(LetterSettings s) =>
        new($"Do you have questions about this letter? Call us at {s.ProgramPhone}. We are glad to help.",
            $"¿Tiene preguntas sobre esta carta? Llámenos al {s.ProgramPhone}. Con gusto le ayudamos.");
}
