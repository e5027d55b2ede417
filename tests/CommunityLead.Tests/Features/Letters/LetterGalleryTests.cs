using CommunityLead.Rules.Households;
using CommunityLead.Tests.Features.Letters.Composing;
using CommunityLead.Tests.Features.Letters.Layout;
using Xunit.Abstractions;

namespace CommunityLead.Tests.Features.Letters;

/// <summary>
/// Every letter case in both languages, rendered as the household gets it, so a person can look at them
/// (`pdftoppm -r 70 -png` on the folder printed below). Each must read back as a letter: its kit code, the
/// deferral to the health department, and at most two pages.
/// </summary>
public class LetterGalleryTests(ITestOutputHelper output)
{
    [Fact]
    public void Render_EveryCaseInEnglishAndSpanish_ReadsBackAsALetter()
    {
        var folder = Environment.GetEnvironmentVariable("COMMUNITYLEAD_LETTER_GALLERY")
            ?? Path.Combine(Path.GetTempPath(), "communitylead-letters");
        Directory.CreateDirectory(folder);
        foreach (var @case in LetterCases.English)
            foreach (var language in new[] { LetterLanguage.En, LetterLanguage.Es })
            {
                var letter = RenderedLetter.Of(@case.Compose(language));
                var name = $"{@case.Name.Replace(' ', '-').Replace(",", "")}-{language.ToString().ToLowerInvariant()}.pdf";
                File.WriteAllBytes(Path.Combine(folder, name), letter.Bytes);
                Assert.Contains(LetterCases.Code, letter.Text);
                Assert.Contains(language == LetterLanguage.En ? "not medical advice" : "no es un consejo médico", letter.Text);
                Assert.True(letter.PageTexts.Count <= 2, $"{name}: {letter.PageTexts.Count} pages");
            }
        output.WriteLine($"Letters written to {folder}");
    }
}
