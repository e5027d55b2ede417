using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>
/// A fixed phrase of the letter that is not in <see cref="MessageCatalog"/>, named for the reviewable wording
/// catalogue. <see cref="Text"/> is the phrase with its variable parts as placeholders ("{healthDepartmentPhone}");
/// <see cref="Example"/> the same phrase with invented values, on which its reading level is measured.
/// </summary>
/// <param name="File">The source file the words live in, under src/CommunityLead.Api/Features/Letters/Composing.</param>
public sealed record LetterPhrase(string Code, string File, Phrase Text, Phrase? Example, string UsedWhen, WordingMarker Marker, string Source);

/// <summary>
/// Every fixed phrase the composer can print, taken from the same members of LetterWords, Contacts and SampleWords
/// that the letters use (called with placeholders), so the list can't drift from the letters. A test composes
/// every kind of letter and checks each heading, label, cell and line matches an entry here.
/// </summary>
internal static partial class LetterPhrases
{
    public static IReadOnlyList<LetterPhrase> All => all.Value;

    /// <summary>Lazy: the parts live in two files, whose static fields have no defined order of initialisation.</summary>
    private static readonly Lazy<IReadOnlyList<LetterPhrase>> all = new(() => [.. Words(), .. Calls(), .. Samples()]);

    private const string LetterWordsFile = "LetterWords.cs";
    private const string ContactsFile = "Contacts.cs";
    private const string SampleWordsFile = "SampleWords.cs";
    private const string Ours = "Our wording.";

    /// <summary>What the settings put in the letter, as placeholders, and as the invented demo program.</summary>
    private static readonly LetterSettings Placeholders = new("{programName}", [], "{programPhone}", null, null,
        "{healthDepartmentName}", "{healthDepartmentPhone}", "{waterUtilityName}", "{waterUtilityPhone}");

    private static readonly LetterSettings Demo = new("Brindle Cove Tap Check", [], "+1 555 0100", null, null,
        "Tallow County Health Department", "+1 555 0140", "Brindle Cove Water Works", "+1 555 0150");

    private static readonly Phrase AmountPlaceholder = new("{amount}", "{amount}");
    private static readonly Phrase AmountExample = MessageWords.Amount(10, Units.MicrogramsPerLiter);

    private static LetterPhrase Fixed(string code, string file, Phrase text, string usedWhen, WordingMarker marker = WordingMarker.OurWording,
        string source = Ours) => new(code, file, text, null, usedWhen, marker, source);

    private static LetterPhrase Filled<T>(string code, string file, Func<T, Phrase> words, T placeholders, T example, string usedWhen,
        WordingMarker marker = WordingMarker.OurWording, string source = Ours) =>
        new(code, file, words(placeholders), words(example), usedWhen, marker, source);

    private static IEnumerable<LetterPhrase> Words()
    {
        foreach (var kind in Enum.GetValues<LetterKind>())
            foreach (var soil in new[] { false, true })
                yield return Fixed($"letter-words.title.{KebabEnum.Name(kind)}-{(soil ? "soil" : "water")}", LetterWordsFile, LetterWords.Title(kind, soil),
                    $"Title of a {KebabEnum.Name(kind)} letter for a {(soil ? "soil" : "water")} kit.");
        yield return Fixed("letter-words.heading.meaning", LetterWordsFile, LetterWords.MeaningHeading, "Heading of a results or corrected letter's first section.");
        yield return Fixed("letter-words.heading.retest", LetterWordsFile, LetterWords.RetestHeading, "Heading of a retest letter's first section.");
        yield return Fixed("letter-words.heading.steps", LetterWordsFile, LetterWords.StepsHeading, "Heading of the numbered steps, every letter.");
        yield return Fixed("letter-words.heading.cautions", LetterWordsFile, LetterWords.CautionsHeading, "Heading of the cautions, every letter.");
        yield return Fixed("letter-words.heading.who-to-call", LetterWordsFile, LetterWords.WhoToCallHeading, "Heading of who to call, every letter.");
        yield return Fixed("letter-words.kit-code", LetterWordsFile, LetterWords.KitCode, "Label in the kit box, every letter.");
        yield return Fixed("letter-words.collected-on", LetterWordsFile, LetterWords.CollectedOn, "Label in the kit box, every letter.");
        yield return Fixed("letter-words.test-kind", LetterWordsFile, LetterWords.TestKind, "Label in the kit box, soil letters.");
        yield return Fixed("letter-words.soil-test", LetterWordsFile, LetterWords.SoilTest, "Value in the kit box, soil letters.");
        yield return Fixed("letter-words.phone", LetterWordsFile, LetterWords.Phone, "Label in the sender block, every letter.");
        yield return Fixed("letter-words.email", LetterWordsFile, LetterWords.Email, "Label in the sender block, when the program has an email address.");
        foreach (var (header, i) in LetterWords.TableHeaders.Select((h, i) => (h, i)))
            yield return Fixed($"letter-words.table-header.{header.En.ToLowerInvariant().Replace(' ', '-')}", LetterWordsFile, header,
                $"Heading of column {i + 1} of the results table, every results letter.");
        yield return Fixed("letter-words.corrected", LetterWordsFile, LetterWords.Corrected, "First paragraph of a corrected-result letter (in place of letter.corrected).");
        yield return Filled("letter-words.table-note", LetterWordsFile, LetterWords.TableNote, "{profileName}", "US federal, Lead and Copper Rule Improvements",
            "Under the results table, every results letter: names the rule profile (in the letter's language).");
        yield return Filled("letter-words.online", LetterWordsFile, p => LetterWords.Online(p.Address, p.Kit), (Address: "{pageAddress}", Kit: "{kitCode}"),
            (Address: "tapcheck.org", Kit: "7KQ4-M2XD-H"),
            "Under the kit facts of every letter issued while the household result page is on (ResultAccess settings); {secret} is the kit's secret.");
        yield return Filled("letter-words.footer", LetterWordsFile, p => LetterWords.Footer(p.Program, p.Kit), (Program: "{programName}", Kit: "{kitCode}"),
            (Program: "Brindle Cove Tap Check", Kit: "7KQ4-M2XD-H"), "Footer of every page.");
        yield return Filled("letter-words.greeting", LetterWordsFile, LetterWords.Greeting, "{name}", "Rosa Quill",
            "First line of the letter, above the title, when the household has a name.");
        yield return Fixed("letter-words.greeting-no-name", LetterWordsFile, LetterWords.Greeting(""), "First line of the letter when no name is on file.");
        yield return Fixed("letter-words.sign-off", LetterWordsFile, LetterWords.SignOff, "Above the signature, every letter.");
        yield return Filled("letter-words.team", LetterWordsFile, LetterWords.Team, "{programName}", "Brindle Cove Tap Check",
            "Signature when the Letters settings name no staff member.");
        yield return Fixed("letter-words.scale-break-note", LetterWordsFile, LetterWords.ScaleBreakNote,
            "Under the scales, when a result is so far above the levels that its bar is cut (broken axis).");
    }

    private static IEnumerable<LetterPhrase> Calls()
    {
        const string Defers = "Every letter defers to the local health department (DOMAIN.md §6; program rule).";
        yield return Filled("contacts.health", ContactsFile, Contacts.CallHealth, Placeholders, Demo,
            "Who to call, first line, homes on public water.", WordingMarker.Practice, Defers);
        yield return Filled("contacts.health-soil", ContactsFile, Contacts.CallHealthAboutSoil, Placeholders, Demo,
            "Who to call, first line, soil letters (they name no water utility).", WordingMarker.Practice, Defers);
        yield return Filled("contacts.health-well", ContactsFile, Contacts.CallHealthAboutWell, Placeholders, Demo,
            "Who to call, first line, homes on a private well (they have no water utility).", WordingMarker.Practice, Defers);
        yield return Filled("contacts.utility", ContactsFile, Contacts.CallUtility, Placeholders, Demo,
            "Who to call, homes on public water when the program has set a water utility.", WordingMarker.Memory,
            "Water systems keep a public inventory of service-line materials (40 CFR 141.84(a), added in 2021; from memory).");
        yield return Fixed("contacts.doctor", ContactsFile, Contacts.CallDoctor, "Who to call, homes with a child under 6 or a pregnancy.",
            WordingMarker.Practice, "Homes with a child under 6 or a pregnancy are told to ask a doctor about a blood lead test (DOMAIN.md §6; program rule).");
        yield return Filled("contacts.program", ContactsFile, Contacts.CallUs, Placeholders, Demo, "Who to call, last line, every letter.");
    }
}
