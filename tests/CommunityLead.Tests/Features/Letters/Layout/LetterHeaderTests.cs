using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Rules.Households;
using CommunityLead.Tests.Features.Letters.Composing;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>The sender's contact lines: a label is never split, and an email address stays whole.</summary>
public class LetterHeaderTests
{
    static RenderedLetter Render(LetterSettings sender, PaperSize paper, LetterLanguage language) =>
        RenderedLetter.Of((LetterCases.Low with { Sender = sender with { Paper = paper } }).Compose(language));

    public static TheoryData<PaperSize> Papers => [PaperSize.Letter, PaperSize.A4];

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_SpanishHeaderWithTheShippedEmail_LabelAndAddressOnOneLine(PaperSize paper)
    {
        var letter = Render(LetterCases.Settings, paper, LetterLanguage.Es);

        Assert.Contains(letter.Lines(0), line => line.Text == "Correo electrónico: tapcheck@example.org");
    }

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_SpanishHeaderWithTheLongestEmail_LabelNeverWrapsAndTheAddressStaysWhole(PaperSize paper)
    {
        var email = LetterCases.LongNames.ProgramEmail!;
        var letter = Render(LetterCases.LongNames, paper, LetterLanguage.Es);
        var lines = letter.Lines(0);

        var label = lines.Single(line => line.Words.Any(w => w.Text == "Correo"));
        Assert.StartsWith("Correo electrónico:", label.Text);
        Assert.Contains(lines, line => line.Words.Any(w => w.Text == email));
        Assert.Empty(PageChecks.OverlappingWords(letter, 0));
    }

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_EnglishHeaderWithTheLongestEmail_AddressStaysWhole(PaperSize paper)
    {
        var letter = Render(LetterCases.LongNames, paper, LetterLanguage.En);

        Assert.Contains(letter.Lines(0), line => line.Words.Any(w => w.Text == LetterCases.LongNames.ProgramEmail));
        Assert.Empty(PageChecks.OverlappingWords(letter, 0));
    }
}
