using CommunityLead.Api.Features.Letters;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>Paper sizes, page counts, and how the body flows from one page to the next.</summary>
public class LetterPagingTests
{
    [Theory]
    // ISO 216 A4 is 210 × 297 mm = 595.3 × 841.9 pt, which PDFsharp writes as 595 × 842; US Letter is 8.5 × 11 in.
    [InlineData(PaperSize.A4, 595, 842)]
    [InlineData(PaperSize.Letter, 612, 792)]
    public void Render_PaperSetting_EveryPageHasThatSize(PaperSize paper, double width, double height)
    {
        var letter = RenderedLetter.Of(LetterSamples.EnglishActionLevel(paper));

        Assert.All(letter.PageSizes, size =>
        {
            Assert.Equal(width, size.Width, 0.5);
            Assert.Equal(height, size.Height, 0.5);
        });
    }

    [Fact]
    public void Render_ShortLetter_FitsOnePage()
    {
        var letter = RenderedLetter.Of(LetterSamples.EnglishNotDetected());

        Assert.Single(letter.PageTexts);
        Assert.Contains("Page 1 of 1", letter.Text);
    }

    [Theory]
    [InlineData(PaperSize.Letter)]
    [InlineData(PaperSize.A4)]
    public void Render_LongestOrdinaryLetter_TakesTwoPages(PaperSize paper)
    {
        var letter = RenderedLetter.Of(LetterSamples.EnglishActionLevel(paper));

        Assert.Equal(2, letter.PageTexts.Count);
        Assert.Contains("Page 2 of 2", letter.PageTexts[1]);
    }

    [Theory]
    [InlineData(PaperSize.Letter)]
    [InlineData(PaperSize.A4)]
    public void Render_AnyLengthThatSpills_ClosingWordsStayWithWhoToCall(PaperSize paper)
    {
        // The caution and the numbers to call are read together; a last page holding only the closing lines
        // looks like a stray sheet. The one-page letter grows a sentence at a time until it has spilt for a while,
        // so one of the lengths is the one where only the closing lines would fall onto page 2.
        var content = LetterSamples.EnglishNotDetected(paper);
        var spilt = 0;
        for (var extra = 1; spilt < 6; extra++)
        {
            var longer = content with
            {
                Cautions = content.Cautions with
                {
                    Paragraphs = [.. content.Cautions.Paragraphs, .. Enumerable.Repeat("Keep the kit's paper with your records.", extra)],
                },
            };
            var letter = RenderedLetter.Of(longer);
            if (letter.PageTexts.Count == 1) continue;
            spilt++;
            Assert.Contains(content.WhoToCall.Heading, letter.PageTexts[^1]);
            Assert.Contains("not medical advice", letter.PageTexts[^1]);
        }
    }

    [Fact]
    public void Render_ContentTooLongForTwoPages_GetsAThirdPageAndDropsNothing()
    {
        var content = LongLetters.ThreeTimesAsLong(LetterSamples.EnglishActionLevel());

        var letter = RenderedLetter.Of(content);

        Assert.Equal(3, letter.PageTexts.Count);
        Assert.All(RenderedLetter.PrintedTexts(content), text => Assert.True(letter.Says(text), text));
    }

    [Fact]
    public void Render_HeadingNearPageFoot_MovesWithItsFirstLine()
    {
        var content = LongLetters.ThreeTimesAsLong(LetterSamples.EnglishActionLevel());

        var letter = RenderedLetter.Of(content);

        foreach (var section in new[] { content.Meaning, content.Steps, content.Cautions, content.WhoToCall })
        {
            var page = letter.PageTexts.Single(text => text.Contains(section.Heading));
            var firstWords = string.Join(' ', section.Paragraphs[0].Split(' ').Take(4));
            Assert.Contains(firstWords, page);
        }
    }

    [Fact]
    public void Render_TableLongerThanAPage_NoRowIsSplit()
    {
        var content = LongLetters.WithManyRows(LetterSamples.EnglishActionLevel(), rows: 40);

        var letter = RenderedLetter.Of(content);

        Assert.True(letter.PageTexts.Count >= 2);
        for (var n = 1; n <= 40; n++)
        {
            var first = PageOf(letter, $"B{n:00}:");
            var last = PageOf(letter, $"E{n:00}");
            Assert.True(first == last, $"Row {n} starts on page {first + 1} and ends on page {last + 1}.");
        }
    }

    static int PageOf(RenderedLetter letter, string word) =>
        letter.PageWords.Select((words, page) => (words, page)).Single(p => p.words.Any(w => w.Text == word)).page;
}
