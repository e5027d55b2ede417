namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The letter's body as blocks in reading order: title, kit facts, greeting, results table, scales and their note,
/// the four sections, the closing paragraph and the signature. Spacing and what keeps together live here;
/// pagination comes later.
/// </summary>
internal static class LetterBody
{
    private const double StepIndent = 16;
    private const double StepGap = 6;

    public static List<Block> Build(LetterContent content, PageGeometry page, LetterFonts fonts, TextMeasure measure, BodySpacing spacing)
    {
        var (x, width) = (page.Left, page.ContentWidth);
        var blocks = new List<Block>();

        blocks.AddRange(KeptTogether(ParagraphBlocks.Lines(measure, content.Title, fonts.Title, Palette.Ink, x, width, 0)));
        blocks.AddRange(KitFactBlocks.Build(measure, fonts, content.KitFacts, x, width, spaceBefore: spacing.AfterTitle));
        if (content.OnlineLine is { } online)
            blocks.AddRange(KeptTogether(ParagraphBlocks.Lines(measure, online.Replace("{secret}", content.ResultSecret ?? "—"),
                fonts.Body, Palette.Ink, x, width, spacing.Greeting)));
        if (!string.IsNullOrWhiteSpace(content.Greeting))
            blocks.AddRange(KeptTogether(ParagraphBlocks.Lines(measure, content.Greeting, fonts.Body, Palette.Ink, x, width, spacing.Greeting)));
        if (content.Results is { } table)
            blocks.AddRange(ResultTableBlocks.Build(measure, fonts, table, x, width, spaceBefore: spacing.Table));
        blocks.AddRange(Scales(content, fonts, measure, spacing, x, width));

        foreach (var section in new[] { content.Meaning, content.Steps, content.Cautions })
            blocks.AddRange(Section(measure, fonts, section, x, width, spacing));
        // Who to call, the closing words (questions, "not medical advice") and the signature travel together: a last
        // page holding only the closing lines reads like a stray sheet, and the caution belongs beside the numbers to call.
        var ending = Section(measure, fonts, content.WhoToCall, x, width, spacing)
            .Concat(ParagraphBlocks.Lines(measure, content.Closing, fonts.Body, Palette.Ink, x, width, spacing.Section))
            .Concat(Signature(content.Signature, fonts, measure, x, width, spacing));
        blocks.AddRange(KeptTogether(ending));
        return blocks;
    }

    /// <summary>The scales, then the note saying how to read a broken bar, kept with the last scale it explains.</summary>
    private static IEnumerable<Block> Scales(LetterContent content, LetterFonts fonts, TextMeasure measure, BodySpacing spacing, double x, double width)
    {
        var hasNote = !string.IsNullOrWhiteSpace(content.ScaleNote);
        for (var i = 0; i < content.Scales.Count; i++)
            yield return LeadScaleBlocks.Build(measure, fonts, content.Scales[i], content.Language, x, width)
                with { SpaceBefore = i == 0 ? spacing.FirstScale : spacing.Scale, KeepWithNext = hasNote && i == content.Scales.Count - 1 };
        if (hasNote)
            foreach (var line in ParagraphBlocks.Lines(measure, content.ScaleNote!, fonts.SmallItalic, Palette.Muted, x, width, 2))
                yield return line;
    }

    private static IEnumerable<Block> Signature(LetterSignature? signature, LetterFonts fonts, TextMeasure measure, double x, double width, BodySpacing spacing)
    {
        if (signature is null)
            return [];
        var lines = ParagraphBlocks.Lines(measure, signature.SignOff, fonts.Body, Palette.Ink, x, width, spacing.Signature)
            .Concat(ParagraphBlocks.Lines(measure, signature.Name, fonts.BodyBold, Palette.Ink, x, width, spacing.Signature));
        return string.IsNullOrWhiteSpace(signature.Title)
            ? lines
            : lines.Concat(ParagraphBlocks.Lines(measure, signature.Title, fonts.Body, Palette.Ink, x, width, 0));
    }

    /// <summary>
    /// A section: its heading, which never ends a page, with at least the first two lines after it; its last two
    /// lines together, so a page never holds a single line of it; a numbered step whole on one page.
    /// </summary>
    private static List<Block> Section(TextMeasure measure, LetterFonts fonts, LetterSection section, double x, double width, BodySpacing spacing)
    {
        var blocks = new List<Block>();
        if (section.Paragraphs.Count == 0)
            return blocks;
        var hasHeading = !string.IsNullOrWhiteSpace(section.Heading);
        if (hasHeading)
            blocks.AddRange(ParagraphBlocks.Lines(measure, section.Heading, fonts.Heading, Palette.Accent, x, width, spacing.Section)
                .Select(line => line with { KeepWithNext = true }));

        // The hanging indent fits the widest number, so "12." keeps its gap like "1." does.
        var indent = Math.Max(StepIndent, measure.Width($"{section.Paragraphs.Count}.", fonts.Body) + StepGap);
        var firstLine = blocks.Count;
        for (var i = 0; i < section.Paragraphs.Count; i++)
        {
            var space = i == 0 ? (hasHeading ? spacing.AfterHeading : spacing.Section) : spacing.Paragraph;
            var lines = section.Numbered
                ? KeptTogether(ParagraphBlocks.Lines(measure, section.Paragraphs[i], fonts.Body, Palette.Ink, x, width, space, $"{i + 1}.", indent))
                : ParagraphBlocks.Lines(measure, section.Paragraphs[i], fonts.Body, Palette.Ink, x, width, space).ToList();
            blocks.AddRange(lines);
        }
        // The first line stays with the second (so a heading is followed by two lines), the last with the one before.
        if (blocks.Count - firstLine >= 2)
        {
            blocks[firstLine] = blocks[firstLine] with { KeepWithNext = true };
            blocks[^2] = blocks[^2] with { KeepWithNext = true };
        }
        return blocks;
    }

    /// <summary>Every block but the last keeps with the next: the group is set on one page (unless it is taller than a page).</summary>
    private static List<Block> KeptTogether(IEnumerable<Block> blocks)
    {
        var list = blocks.ToList();
        for (var i = 0; i < list.Count - 1; i++)
            list[i] = list[i] with { KeepWithNext = true };
        return list;
    }
}
