using CommunityLead.Api.Features.Letters;
using CommunityLead.Rules.Households;
using CommunityLead.Tests.Features.Letters.Composing;
using Xunit.Abstractions;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>
/// Every composed letter case, in English and Spanish, rendered and read back whole. Set COMMUNITYLEAD_LETTER_GALLERY
/// to a folder to keep the PDFs there and look at them (`pdftoppm -r 70 -png letter.pdf page`); the page counts go
/// to the test output.
/// </summary>
public class LetterGalleryTests(ITestOutputHelper output)
{
    public static TheoryData<string, LetterLanguage> Cases()
    {
        var data = new TheoryData<string, LetterLanguage>();
        foreach (var @case in LetterCases.English)
            foreach (var language in new[] { LetterLanguage.En, LetterLanguage.Es })
                data.Add(@case.Name, language);
        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Render_EveryComposedLetter_AtMostTwoPagesEveryTextPrintedNothingOverlaps(string name, LetterLanguage language)
    {
        var content = LetterCases.English.Single(c => c.Name == name).Compose(language);
        var letter = RenderedLetter.Of(content);
        Keep($"{name}-{language}", letter.Bytes);
        output.WriteLine($"{name} ({language}): {letter.PageWords.Count} page(s)");

        Assert.InRange(letter.PageWords.Count, 1, 2);
        var missing = RenderedLetter.PrintedTexts(content).Where(text => !string.IsNullOrWhiteSpace(text) && !letter.Says(text)).ToList();
        Assert.True(missing.Count == 0, "Not found in the PDF:\n" + string.Join("\n", missing));
        var problems = Enumerable.Range(0, letter.PageWords.Count)
            .SelectMany(page => PageChecks.OverlappingWords(letter, page).Concat(PageChecks.WordsCrossingDrawings(letter, page))).ToList();
        Assert.True(problems.Count == 0, string.Join("\n", problems));
    }

    static void Keep(string name, byte[] pdf)
    {
        if (Environment.GetEnvironmentVariable("COMMUNITYLEAD_LETTER_GALLERY") is { Length: > 0 } folder)
            File.WriteAllBytes(Path.Combine(folder, string.Concat(name.Select(c => char.IsLetterOrDigit(c) ? c : '-')) + ".pdf"), pdf);
    }
}
