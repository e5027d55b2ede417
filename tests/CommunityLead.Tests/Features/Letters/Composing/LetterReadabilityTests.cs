using CommunityLead.Rules.Reading;
using Xunit.Abstractions;
using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>
/// Every English paragraph of every letter kind — sections, table note, closing, with the settings' real names and
/// phone numbers in it, short ones and long ones — at Flesch–Kincaid grade 8 or below (EPA asks for no more than 7th–8th grade; DOMAIN.md §7).
/// </summary>
public class LetterReadabilityTests(ITestOutputHelper output)
{
    private const double MaxGrade = 8;

    [Fact]
    public void Compose_EveryEnglishLetter_EveryParagraphAtMostGradeEight()
    {
        var letters = English.Concat(English.Select(c => c with { Name = c.Name + ", long names", Sender = LongNames }));
        var graded = letters.SelectMany(c => LetterText.Paragraphs(c.Compose()).Select(p => (c.Name, Text: p, Grade: Readability.FleschKincaidGrade(p))))
            .DistinctBy(g => g.Text).OrderByDescending(g => g.Grade).ToList();
        output.WriteLine("Hardest paragraphs:\n" + Describe(graded.Take(6)));

        var tooHard = graded.Where(g => g.Grade > MaxGrade).ToList();
        Assert.True(tooHard.Count == 0, "Above grade 8:\n" + Describe(tooHard));
    }

    private static string Describe(IEnumerable<(string Case, string Text, double Grade)> graded) =>
        string.Join("\n", graded.Select(g => $"  {g.Grade:0.0} [{g.Case}] {g.Text}"));
}
