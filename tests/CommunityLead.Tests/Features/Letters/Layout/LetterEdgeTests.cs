using CommunityLead.Api.Features.Letters;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>Unusual but possible contents: nothing is dropped, nothing leaves the page's margins.</summary>
public class LetterEdgeTests
{
    const double Margin = 20 * 72 / 25.4;

    public static TheoryData<string, PaperSize> Cases => new()
    {
        { "retest", PaperSize.Letter },
        { "retest", PaperSize.A4 },
        { "crowded", PaperSize.Letter },
        { "crowded", PaperSize.A4 },
    };

    static LetterContent Content(string name, PaperSize paper) => name == "retest" ? OddLetters.Retest(paper) : OddLetters.Crowded(paper);

    [Theory]
    [MemberData(nameof(Cases))]
    public void Render_UnusualContent_EveryWordIsPrinted(string name, PaperSize paper)
    {
        var content = Content(name, paper);
        var letter = RenderedLetter.Of(content);

        // A word longer than a line is cut across lines, so compare the text with all spacing taken out.
        var printed = string.Concat(letter.Text.Where(c => !char.IsWhiteSpace(c)));
        var missing = RenderedLetter.PrintedTexts(content)
            .Where(text => !printed.Contains(string.Concat(text.Where(c => !char.IsWhiteSpace(c))), StringComparison.Ordinal)
                && !letter.Says(text))
            .ToList();
        Assert.True(missing.Count == 0, "Not found:\n" + string.Join("\n", missing));
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Render_UnusualContent_NoWordCrossesThePageMargins(string name, PaperSize paper)
    {
        var letter = RenderedLetter.Of(Content(name, paper));

        for (var page = 0; page < letter.PageWords.Count; page++)
        {
            var (width, height) = letter.PageSizes[page];
            Assert.All(letter.PageWords[page], word => Assert.True(
                word.BoundingBox.Left >= Margin - 0.5 && word.BoundingBox.Right <= width - Margin + 0.5
                && word.BoundingBox.Bottom >= Margin - 0.5 && word.BoundingBox.Top <= height - Margin + 0.5,
                $"Page {page + 1}: '{word.Text}' crosses a margin."));
        }
    }

    [Fact]
    public void Render_RetestLetter_FitsOnePage()
    {
        Assert.Single(RenderedLetter.Of(OddLetters.Retest()).PageTexts);
    }

    [Fact]
    public void Render_EverythingEmpty_StillOnePageWithItsPageNumber()
    {
        var letter = RenderedLetter.Of(OddLetters.Empty());

        Assert.Single(letter.PageTexts);
        Assert.Contains("Page 1 of 1", letter.Text);
    }
}
