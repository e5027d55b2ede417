using CommunityLead.Api.Features.Letters;
using UglyToad.PdfPig.Content;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>Where things land on the sheet, read back from the PDF (PDF coordinates: origin bottom-left, points).</summary>
public class LetterPlacementTests
{
    const double Inch = 72;
    const double Mm = 72 / 25.4;
    const double Margin = 20 * Mm;
    const double Tolerance = 0.5;

    // Window positions from common practice, from memory (as in PageGeometry, written out again here on purpose):
    // #10 envelope window 4.5 × 1.125 in, 7/8 in from the left and 2 in from the top of a tri-folded US Letter sheet;
    // DL window 90 × 45 mm, 20 mm from the left and 45 mm from the top of A4 (DIN 5008 form B address field).
    public static TheoryData<PaperSize, double, double, double, double, double> Windows => new()
    {
        { PaperSize.Letter, 792, 0.875 * Inch, 2 * Inch, 4.5 * Inch, 1.125 * Inch },
        { PaperSize.A4, 842, 20 * Mm, 45 * Mm, 90 * Mm, 45 * Mm },
    };

    [Theory]
    [MemberData(nameof(Windows))]
    public void Render_WindowEnvelope_RecipientLiesInsideTheWindow(
        PaperSize paper, double pageHeight, double left, double fromTop, double width, double height)
    {
        var content = LetterSamples.EnglishActionLevel(paper);
        var letter = RenderedLetter.Of(content);

        var recipient = RecipientWords(letter.PageWords[0], content.Recipient);

        var (bottom, top) = (pageHeight - fromTop - height, pageHeight - fromTop);
        Assert.All(recipient, word =>
        {
            var box = word.BoundingBox;
            Assert.True(box.Left >= left && box.Right <= left + width && box.Bottom >= bottom && box.Top <= top,
                $"'{word.Text}' at ({box.Left:F1}, {box.Bottom:F1})–({box.Right:F1}, {box.Top:F1}) is outside the window.");
        });
    }

    [Theory]
    [InlineData("en-action")]
    [InlineData("en-action-a4")]
    [InlineData("es")]
    [InlineData("es-letter")]
    [InlineData("en-not-detected")]
    public void Render_RealisticLetter_NoWordCrossesThePageMargins(string sample)
    {
        var letter = RenderedLetter.Of(LetterTextTests.Sample(sample));

        for (var page = 0; page < letter.PageWords.Count; page++)
        {
            var (width, height) = letter.PageSizes[page];
            Assert.All(letter.PageWords[page], word =>
            {
                var box = word.BoundingBox;
                Assert.True(box.Left >= Margin - Tolerance && box.Right <= width - Margin + Tolerance
                    && box.Bottom >= Margin - Tolerance && box.Top <= height - Margin + Tolerance,
                    $"Page {page + 1}: '{word.Text}' at ({box.Left:F1}, {box.Bottom:F1})–({box.Right:F1}, {box.Top:F1}) crosses a margin.");
            });
        }
    }

    [Fact]
    public void Render_ContentTooLongForTwoPages_NoWordCrossesThePageMargins()
    {
        var letter = RenderedLetter.Of(LongLetters.WithManyRows(LongLetters.ThreeTimesAsLong(LetterSamples.Spanish()), rows: 30));

        Assert.All(letter.PageWords.SelectMany(words => words), word =>
            Assert.True(word.BoundingBox.Bottom >= Margin - Tolerance && word.BoundingBox.Top <= 842 - Margin + Tolerance, word.Text));
    }

    /// <summary>
    /// The recipient's words: each line found as a run of words, after the line before it (PdfPig lists words
    /// top-down, and the program's own address may share the recipient's town line).
    /// </summary>
    static List<Word> RecipientWords(IReadOnlyList<Word> words, IReadOnlyList<string> lines)
    {
        var found = new List<Word>();
        var from = 0;
        foreach (var line in lines)
        {
            var wanted = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            var start = Enumerable.Range(from, Math.Max(0, words.Count - wanted.Length - from + 1))
                .First(at => wanted.Select((text, i) => words[at + i].Text == text).All(match => match));
            found.AddRange(words.Skip(start).Take(wanted.Length));
            from = start + wanted.Length;
        }
        return found;
    }
}
