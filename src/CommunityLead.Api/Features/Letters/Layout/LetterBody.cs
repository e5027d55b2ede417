namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The letter's body as blocks in reading order: title, kit facts, results table, scales, the four sections
/// and the closing paragraph. Spacing lives here; pagination comes later.
/// </summary>
internal static class LetterBody
{
    private const double SectionSpace = 14;
    private const double ParagraphSpace = 5;
    private const double StepIndent = 16;
    private const double StepGap = 6;

    public static List<Block> Build(LetterContent content, PageGeometry page, LetterFonts fonts, TextMeasure measure)
    {
        var (x, width) = (page.Left, page.ContentWidth);
        var blocks = new List<Block>();

        var title = ParagraphBlocks.Lines(measure, content.Title, fonts.Title, Palette.Ink, x, width, 0).ToList();
        blocks.AddRange(title.Select((line, i) => i == title.Count - 1 ? line with { KeepWithNext = true } : line));
        blocks.AddRange(KitFactBlocks.Build(measure, fonts, content.KitFacts, x, width, spaceBefore: 8));
        if (content.Results is { } table)
            blocks.AddRange(ResultTableBlocks.Build(measure, fonts, table, x, width, spaceBefore: 12));
        foreach (var scale in content.Scales)
            blocks.AddRange(LeadScaleBlocks.Build(measure, fonts, scale, content.Language, x, width, spaceBefore: 12));

        foreach (var section in new[] { content.Meaning, content.Steps, content.Cautions })
            blocks.AddRange(Section(measure, fonts, section, x, width));
        // Who to call and the closing words (questions, "not medical advice") travel together: a last page holding
        // only the closing lines reads like a stray sheet, and the caution belongs beside the numbers to call.
        var ending = Section(measure, fonts, content.WhoToCall, x, width)
            .Concat(ParagraphBlocks.Lines(measure, content.Closing, fonts.Body, Palette.Ink, x, width, SectionSpace)).ToList();
        blocks.AddRange(ending.Select((line, i) => i < ending.Count - 1 ? line with { KeepWithNext = true } : line));
        return blocks;
    }

    private static IEnumerable<Block> Section(TextMeasure measure, LetterFonts fonts, LetterSection section, double x, double width)
    {
        if (section.Paragraphs.Count == 0)
            yield break;
        var hasHeading = !string.IsNullOrWhiteSpace(section.Heading);
        if (hasHeading)
            foreach (var line in ParagraphBlocks.Lines(measure, section.Heading, fonts.Heading, Palette.Accent, x, width, SectionSpace))
                yield return line with { KeepWithNext = true };

        // The hanging indent fits the widest number, so "12." keeps its gap like "1." does.
        var indent = Math.Max(StepIndent, measure.Width($"{section.Paragraphs.Count}.", fonts.Body) + StepGap);
        for (var i = 0; i < section.Paragraphs.Count; i++)
        {
            var space = i == 0 ? (hasHeading ? 3 : SectionSpace) : ParagraphSpace;
            var lines = section.Numbered
                ? ParagraphBlocks.Lines(measure, section.Paragraphs[i], fonts.Body, Palette.Ink, x, width, space, $"{i + 1}.", indent)
                : ParagraphBlocks.Lines(measure, section.Paragraphs[i], fonts.Body, Palette.Ink, x, width, space);
            foreach (var line in lines)
                yield return line;
        }
    }
}
