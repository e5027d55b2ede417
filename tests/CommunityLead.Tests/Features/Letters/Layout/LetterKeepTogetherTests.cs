using CommunityLead.Api.Features.Letters;
using CommunityLead.Api.Features.Letters.Layout;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>
/// Nothing stranded across a page break, over many lengths of letter: a heading never ends a page, a numbered step is
/// never split, and no page holds a single line of a section. A letter that fits one sheet with tighter spacing does.
/// </summary>
public class LetterKeepTogetherTests
{
    static readonly string[] Headings = ["What your results mean", "What to do now", "Keep in mind", "Who to call"];

    const string Sentence = "Run the cold tap before you use the water for drinking or cooking.";

    /// <summary>
    /// The one-page letter with more steps and cautions each time, of one to four lines each, every step marked at its
    /// first and last word ("S03a" … "S03z") so a split shows.
    /// </summary>
    static LetterContent Grown(int extra, PaperSize paper)
    {
        var content = LetterSamples.EnglishNotDetected(paper);
        var steps = Enumerable.Range(1, 2 + extra % 6)
            .Select(i => $"S{i:00}a {string.Join(' ', Enumerable.Repeat(Sentence, 1 + 2 * (i % 3)))} S{i:00}z");
        var cautions = Enumerable.Range(1, extra / 3).Select(i => string.Join(" ", Enumerable.Repeat(Sentence, 1 + i % 3)));
        return content with
        {
            Meaning = content.Meaning with { Paragraphs = [.. content.Meaning.Paragraphs, string.Join(' ', Enumerable.Repeat(Sentence, 2 + extra % 4))] },
            Steps = content.Steps with { Paragraphs = [.. steps] },
            Cautions = new LetterSection("Keep in mind", [.. cautions]),
        };
    }

    /// <summary>The one-page letter with one more single-line caution each time: every break position in turn.</summary>
    static LetterContent OneLineCautions(int lines, PaperSize paper)
    {
        var content = LetterSamples.EnglishNotDetected(paper);
        return content with { Cautions = new LetterSection("Keep in mind", [.. Enumerable.Range(1, lines).Select(i => $"Caution line {i}: keep the kit's paper.")]) };
    }

    /// <summary>Both growing letters, 36 lengths each.</summary>
    static IEnumerable<LetterContent> Lengths(PaperSize paper) =>
        Enumerable.Range(0, 36).Select(extra => Grown(extra, paper)).Concat(Enumerable.Range(1, 36).Select(lines => OneLineCautions(lines, paper)));

    public static TheoryData<PaperSize> Papers => [PaperSize.Letter, PaperSize.A4];

    /// <summary>A page's lines without its footer (the last line: the footer text and "Page N of M" share it).</summary>
    static List<string> BodyLines(RenderedLetter letter, int page) => [.. letter.Lines(page).SkipLast(1).Select(l => l.Text)];

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_ManyLengths_NoHeadingEndsAPage(PaperSize paper)
    {
        foreach (var content in Lengths(paper))
        {
            var letter = RenderedLetter.Of(content);
            for (var page = 0; page < letter.PageWords.Count - 1; page++)
                Assert.DoesNotContain(BodyLines(letter, page)[^1], Headings);
        }
    }

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_ManyLengths_NoNumberedStepSplitsAcrossPages(PaperSize paper)
    {
        var spilt = 0;
        for (var extra = 0; extra < 36; extra++)
        {
            var letter = RenderedLetter.Of(Grown(extra, paper));
            spilt += letter.PageWords.Count > 1 ? 1 : 0;
            for (var step = 1; step <= 2 + extra % 6; step++)
                Assert.True(PageOf(letter, $"S{step:00}a") == PageOf(letter, $"S{step:00}z"), $"extra {extra}: step {step} is split");
        }
        Assert.True(spilt > 10, "The sweep should reach two-page letters often.");
    }

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_ManyLengths_NoPageHoldsASingleLineOfASection(PaperSize paper)
    {
        foreach (var (content, length) in Lengths(paper).Select((content, i) => (content, i)))
        {
            var letter = RenderedLetter.Of(content);
            // A section split by a page break: its part before the break and its part after it, each at least 2 lines.
            for (var page = 0; page + 1 < letter.PageWords.Count; page++)
            {
                var (lines, next) = (BodyLines(letter, page), BodyLines(letter, page + 1));
                var carried = next.TakeWhile(line => !Headings.Contains(line)).Count();
                if (carried == 0)
                    continue;
                var lastHeading = lines.FindLastIndex(line => Headings.Contains(line));
                var before = lastHeading < 0 ? int.MaxValue : lines.Count - lastHeading - 1;
                var around = lines.TakeLast(4).Append("-- page break --").Concat(next.Take(4));
                Assert.True(carried >= 2 && before >= 2,
                    $"length {length}, pages {page + 1}–{page + 2}: {before} line(s) before the break, {carried} after:\n{string.Join("\n", around)}");
            }
        }
    }

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_ALittleTooLongForOnePage_TightSpacingKeepsItOnOne(PaperSize paper)
    {
        // A short letter without results (as a retest letter is) grows a caution line at a time. The gap above "Keep
        // in mind" tells the spacing apart: regular while the letter fits, tight only when the regular spacing would
        // have spilt onto a second page.
        LetterContent Longer(int lines)
        {
            var content = LetterSamples.EnglishNotDetected(paper);
            return content with
            {
                Results = null,
                Scales = [],
                Steps = content.Steps with { Paragraphs = content.Steps.Paragraphs.Take(1).ToList() },
                Cautions = new LetterSection("Keep in mind", [.. Enumerable.Repeat("Keep the kit's paper with your records.", lines)]),
            };
        }
        var regular = GapAbove(RenderedLetter.Of(Longer(1)), "Keep in mind");
        var shrink = BodySpacing.Regular.Section - BodySpacing.Tight.Section;
        var (tightened, lines) = (0, 1);
        for (; RenderedLetter.Of(Longer(lines)) is var letter && letter.PageWords.Count == 1; lines++)
            if (GapAbove(letter, "Keep in mind") < regular - shrink / 2)
                tightened++;

        Assert.True(tightened > 0, "No length was pulled back onto one page by the tighter spacing.");
        Assert.True(lines > 3, "The short letter should take a few more lines before it spills.");
    }

    [Fact]
    public void Render_ShortLetterWithGreetingAndSignature_OnePageEndingWithTheSignature()
    {
        var content = LetterSamples.EnglishNotDetected();
        var letter = RenderedLetter.Of(content);

        Assert.Single(letter.PageWords);
        var lines = BodyLines(letter, 0);
        Assert.Equal(["Sincerely,", "Dana Whitfield", "Program Coordinator"], lines[^3..]);
        Assert.True(lines.IndexOf("Dear Maria Lopez,") < lines.FindIndex(l => l.StartsWith("Sample")), "The greeting comes before the results.");
        Assert.True(letter.Says(content.Closing));
    }

    [Theory]
    [MemberData(nameof(Papers))]
    public void Render_TwoPageLetter_SignatureOnTheLastPageAfterTheClosing(PaperSize paper)
    {
        var letter = RenderedLetter.Of(LetterSamples.EnglishActionLevel(paper));

        var last = BodyLines(letter, letter.PageWords.Count - 1);
        Assert.Equal(["Sincerely,", "Dana Whitfield", "Program Coordinator"], last[^3..]);
        Assert.Contains(last, l => l.Contains("not medical advice"));
        Assert.Contains("Dear Maria Lopez,", BodyLines(letter, 0));
    }

    static double GapAbove(RenderedLetter letter, string heading)
    {
        var lines = letter.Lines(0);
        var at = lines.ToList().FindIndex(l => l.Text == heading);
        return lines[at - 1].Baseline - lines[at].Baseline;
    }

    static int PageOf(RenderedLetter letter, string word) =>
        letter.PageWords.Select((words, page) => (words, page)).Single(p => p.words.Any(w => w.Text == word)).page;
}
