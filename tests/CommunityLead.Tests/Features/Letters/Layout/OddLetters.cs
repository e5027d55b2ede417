using CommunityLead.Api.Features.Letters;
using CommunityLead.Rules.Households;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>Contents at the edges of what the composer might send: the layout must still place every word.</summary>
public static class OddLetters
{
    /// <summary>A retest letter: no results table and no scales, one empty section.</summary>
    public static LetterContent Retest(PaperSize paper = PaperSize.Letter) => LetterSamples.EnglishNotDetected(paper) with
    {
        Kind = LetterKind.Retest,
        Title = "Please test your water again",
        Results = null,
        Scales = [],
        Steps = new LetterSection("What to do now",
            ["We will send you a new kit. Fill the new bottles the same way. First let the water sit unused for at least 6 hours, such as overnight."],
            Numbered: true),
    };

    /// <summary>Crowded levels, a result past the scale's end, a long address, a web address longer than a line.</summary>
    public static LetterContent Crowded(PaperSize paper = PaperSize.Letter) => LetterSamples.EnglishActionLevel(paper) with
    {
        Program = new ProgramBlock("Riverbend Community Lead Testing Program",
            ["Environmental Health Division", "Riverbend County Services Building", "412 Alder Street, Suite 2", "Riverbend, OR 97000"],
            ["Phone: (555) 010-4477", "Text: (555) 010-4478", "Email: leadtest@riverbend.example.org", "Web: riverbend.example.org/lead"]),
        Recipient = ["Maria Guadalupe Lopez-Hernandez and Jonathan Alexander Whitfield-Smith", "c/o Riverbend Tenants' Association", "Building C, Unit 1187-B", "1187 Cedar Lane North East", "Riverbend, OR 97000-1234", "United States"],
        Scales =
        [
            new LeadScale("Kitchen tap, first draw", 42, "42 µg/L (past the end of the scale)",
                [new(1, "School level"), new(5, "Caution level"), new(10, "Action level"), new(15, "Old action level")], 20, "µg/L"),
        ],
        Closing = "See https://riverbend.example.org/lead-testing/results/explained/for-households/what-your-numbers-mean-and-what-to-do-next for more.",
    };

    /// <summary>Every optional part left empty: the layout must still make a valid one-page letter.</summary>
    public static LetterContent Empty() => new(
        LetterLanguage.En, LetterKind.Results, PaperSize.Letter, new ProgramBlock("", [], []), "", [], "", [],
        new ResultTable([], [], ""), [], new LetterSection("", []), new LetterSection("", [], Numbered: true),
        new LetterSection("", []), new LetterSection("", []), "", "");
}
