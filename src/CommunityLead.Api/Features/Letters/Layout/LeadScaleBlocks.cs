using CommunityLead.Rules.Households;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// One lead result as a picture: a bar from 0 to the scale's end, darker past each level, a labelled tick at
/// every level, and a marker at the result with its value written beside it. Labels carry the meaning,
/// the greys only repeat it.
/// </summary>
internal static class LeadScaleBlocks
{
    private const double BarHeight = 10;
    private const double TickOverhang = 3;
    private const double AxisGap = 5;

    public static IEnumerable<Block> Build(
        TextMeasure measure, LetterFonts fonts, LeadScale scale, LetterLanguage language, double x, double width, double spaceBefore)
    {
        var caption = ParagraphBlocks.Lines(measure, scale.Label, fonts.BodyBold, Palette.Ink, x, width, spaceBefore).ToList();
        caption[^1] = caption[^1] with { KeepWithNext = true };
        foreach (var line in caption)
            yield return line;

        // A scale without a usable end still gets one, so the marker and ticks have somewhere to go.
        var maximum = scale.Maximum > 0 ? scale.Maximum : Math.Max(1, scale.Levels.Select(l => l.Value).DefaultIfEmpty(1).Max());
        const string zero = "0";
        var end = (ScaleNumber.Format(maximum, language) + " " + scale.Unit).Trim();
        var barLeft = x + measure.Width(zero, fonts.Small) + AxisGap;
        var barRight = x + width - measure.Width(end, fonts.Small) - AxisGap;
        double XOf(double value) => barLeft + (barRight - barLeft) * Math.Clamp(value, 0, maximum) / maximum;

        var marker = ScaleMarker.Plan(measure, fonts.BodyBold, scale.ValueText, XOf(scale.Value), x, x + width);
        var labelled = scale.Levels.Select(level => level with { Label = WithNumber(level, language) });
        var ticks = ScaleTicks.Plan(measure, fonts.Small, labelled, XOf, x, x + width);
        var barTop = marker.Height + 1;
        var axisTop = (BarHeight - Typeset.LineHeight(fonts.Small)) / 2;

        yield return new Block(barTop + BarHeight + TickOverhang + 1 + ticks.Height + 2, (g, top) =>
        {
            var bar = top + barTop;
            DrawBands(g, scale.Levels, XOf, barLeft, barRight, bar);
            Typeset.Left(g, zero, fonts.Small, Palette.Ink, x, bar + axisTop);
            Typeset.Right(g, end, fonts.Small, Palette.Ink, x + width, bar + axisTop);
            ticks.Draw(g, bar - TickOverhang, bar + BarHeight + TickOverhang, bar + BarHeight + TickOverhang + 1);
            marker.Draw(g, top, bar, bar + BarHeight);
        })
        { SpaceBefore = 3 };
    }

    /// <summary>"Action level 10": the level's number under its tick, unless its label already says it.</summary>
    private static string WithNumber(ScaleMark level, LetterLanguage language)
    {
        var number = ScaleNumber.Format(level.Value, language);
        return level.Label.Contains(number, StringComparison.Ordinal) ? level.Label : $"{level.Label} {number}";
    }

    private static void DrawBands(XGraphics g, IReadOnlyList<ScaleMark> levels, Func<double, double> xOf, double left, double right, double top)
    {
        var edges = levels.Select(l => xOf(l.Value)).Where(e => e > left && e < right).Order().Prepend(left).Append(right).ToArray();
        for (var i = 0; i < edges.Length - 1; i++)
            g.DrawRectangle(Palette.ScaleBands[Math.Min(i, Palette.ScaleBands.Length - 1)], edges[i], top, edges[i + 1] - edges[i], BarHeight);
        g.DrawRectangle(Palette.Outline, left, top, right - left, BarHeight);
    }
}
