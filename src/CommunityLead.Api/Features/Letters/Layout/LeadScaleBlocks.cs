using CommunityLead.Rules.Households;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// One lead result as a picture, in one block: its caption, a bar across the whole line (so bars sharing an axis line
/// up), darker past each level, a tick at every level, the result's marker with its value above the bar, and under
/// the bar the axis numbers and the levels' labels. Labels carry the meaning, the greys only repeat it.
/// </summary>
internal static class LeadScaleBlocks
{
    private const double BarHeight = 9;
    private const double TickOverhang = 3;
    private const double CaptionGap = 12;

    public static Block Build(TextMeasure measure, LetterFonts fonts, LeadScale scale, LetterLanguage language, double x, double width)
    {
        var axis = ScaleAxis.For(scale, x, x + width);
        var captionFont = fonts.BodyBold;
        var caption = measure.Wrap(scale.Label, captionFont, width);
        var lineHeight = Typeset.LineHeight(captionFont);
        var marker = ScaleMarker.Plan(measure, fonts.BodyBold, scale.ValueText, axis.XOf(scale.Value), x, x + width);
        // The value shares the caption's last line when it clears it, saving a line per scale.
        var shared = marker.OneLine && x + measure.Width(caption[^1], captionFont) + CaptionGap <= marker.Extent.Left;
        var barTop = shared ? caption.Count * lineHeight + 1 : caption.Count * lineHeight + marker.Height;

        var labels = ScaleLabels.Plan(measure, fonts.Small, AxisNumbers(measure, fonts.Small, scale, axis, language),
            scale.Levels.Select(level => (WithNumber(level, language), axis.XOf(level.Value))), x, x + width);
        var labelsTop = barTop + BarHeight + TickOverhang + 1;

        return new Block(labelsTop + labels.Height, (g, top) =>
        {
            for (var i = 0; i < caption.Count; i++)
                Typeset.Left(g, caption[i], captionFont, Palette.Ink, x, top + i * lineHeight);
            var (bar, barBottom) = (top + barTop, top + barTop + BarHeight);
            DrawBands(g, scale.Levels, axis, bar);
            foreach (var level in scale.Levels)
                g.DrawLine(Palette.Tick, axis.XOf(level.Value), bar, axis.XOf(level.Value), barBottom + TickOverhang);
            axis.DrawBreak(g, bar, barBottom, TickOverhang);
            marker.Draw(g, bar, barBottom);
            labels.Draw(g, top + labelsTop);
        });
    }

    /// <summary>"0" under the bar's start, the break's number under the break, the end with its unit under the end.</summary>
    private static IEnumerable<(string Text, double Left)> AxisNumbers(TextMeasure measure, XFont font, LeadScale scale, ScaleAxis axis, LetterLanguage language)
    {
        yield return ("0", axis.Left);
        if (axis.BreakAt is { } breakAt)
        {
            var number = ScaleNumber.Format(breakAt, language);
            yield return (number, axis.BreakX + ScaleAxis.Gap / 2 - measure.Width(number, font) / 2);
        }
        var end = (ScaleNumber.Format(axis.Maximum, language) + " " + scale.Unit).Trim();
        yield return (end, axis.Right - measure.Width(end, font));
    }

    /// <summary>"Action level 10": the level's number under its tick, unless its label already says it.</summary>
    private static string WithNumber(ScaleMark level, LetterLanguage language)
    {
        var number = ScaleNumber.Format(level.Value, language);
        return level.Label.Contains(number, StringComparison.Ordinal) ? level.Label : $"{level.Label} {number}";
    }

    /// <summary>Bands darken past each level; a broken axis leaves its gap white and outlines each part of the bar.</summary>
    private static void DrawBands(XGraphics g, IReadOnlyList<ScaleMark> levels, ScaleAxis axis, double top)
    {
        var edges = levels.Select(l => axis.XOf(l.Value)).Where(e => e > axis.Left && e < axis.Right).Order()
            .Prepend(axis.Left).Append(axis.Right).ToArray();
        for (var i = 0; i < edges.Length - 1; i++)
            g.DrawRectangle(Palette.ScaleBands[Math.Min(i, Palette.ScaleBands.Length - 1)], edges[i], top, edges[i + 1] - edges[i], BarHeight);
        if (axis.BreakAt is not null)
            g.DrawRectangle(XBrushes.White, axis.BreakX, top - 0.5, ScaleAxis.Gap, BarHeight + 1);
        foreach (var (left, right) in axis.Segments())
            g.DrawRectangle(Palette.Outline, left, top, right - left, BarHeight);
    }
}
