namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>The kit's facts as label/value pairs: labels in bold in a narrow column, values beside them.</summary>
internal static class KitFactBlocks
{
    private const double Gap = 10;

    public static IEnumerable<Block> Build(
        TextMeasure measure, LetterFonts fonts, IReadOnlyList<LabeledValue> facts, double x, double width, double spaceBefore)
    {
        var labelWidth = Math.Min(
            facts.Select(f => measure.Width(f.Label, fonts.BodyBold)).DefaultIfEmpty(0).Max(),
            width * 0.4);
        var valueX = x + labelWidth + Gap;
        var valueWidth = width - labelWidth - Gap;
        var lineHeight = Typeset.LineHeight(fonts.Body);

        for (var i = 0; i < facts.Count; i++)
        {
            var labels = measure.Wrap(facts[i].Label, fonts.BodyBold, labelWidth);
            var values = measure.Wrap(facts[i].Value, fonts.Body, valueWidth);
            yield return new Block(Math.Max(labels.Count, values.Count) * lineHeight, (g, top) =>
            {
                for (var l = 0; l < labels.Count; l++)
                    Typeset.Left(g, labels[l], fonts.BodyBold, Palette.Ink, x, top + l * lineHeight);
                for (var l = 0; l < values.Count; l++)
                    Typeset.Left(g, values[l], fonts.Body, Palette.Ink, valueX, top + l * lineHeight);
            })
            { SpaceBefore = i == 0 ? spaceBefore : 1 };
        }
    }
}
