using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Where a value falls on a scale's bar. The bar spans the whole line, so every bar of a letter with the same end and
/// break maps a value to the same place. A broken axis draws 0 to the break to size over most of the bar, leaves a
/// small gap, and squeezes the break to the end into the rest: levels keep their room next to a very high result.
/// </summary>
internal sealed class ScaleAxis(double left, double right, double maximum, double? breakAt)
{
    /// <summary>The share of the bar drawn to size when the axis breaks [our choice: most of it, the levels live there].</summary>
    public const double ToSizeShare = 0.8;

    /// <summary>The gap in the bar at the break, in points.</summary>
    public const double Gap = 6;

    public double Left => left;
    public double Right => right;
    public double Maximum => maximum;
    public double? BreakAt => breakAt;

    /// <summary>Where the to-size part ends (the gap's left edge); the right end when the axis is not broken.</summary>
    public double BreakX => breakAt is null ? right : left + ToSizeShare * (right - left - Gap);

    public static ScaleAxis For(LeadScale scale, double left, double right)
    {
        // A scale without a usable end still gets one, so the marker and ticks have somewhere to go.
        var maximum = scale.Maximum > 0 ? scale.Maximum : Math.Max(1, scale.Levels.Select(l => l.Value).DefaultIfEmpty(1).Max());
        var breakAt = scale.BreakAt is { } b && b > 0 && b < maximum ? b : (double?)null;
        return new ScaleAxis(left, right, maximum, breakAt);
    }

    public double XOf(double value)
    {
        var v = Math.Clamp(value, 0, maximum);
        if (breakAt is not { } b)
            return left + (right - left) * v / maximum;
        if (v <= b)
            return left + (BreakX - left) * v / b;
        var tailLeft = BreakX + Gap;
        return tailLeft + (right - tailLeft) * (v - b) / (maximum - b);
    }

    /// <summary>The parts of the bar that are drawn: one, or two either side of the break's gap.</summary>
    public IEnumerable<(double Left, double Right)> Segments() =>
        breakAt is null ? [(left, right)] : [(left, BreakX), (BreakX + Gap, right)];

    /// <summary>Two slanted strokes across the gap ("//"), from the bar's top to just below it: never above, where the value is written.</summary>
    public void DrawBreak(XGraphics g, double barTop, double barBottom, double below)
    {
        if (breakAt is null) return;
        var slant = Gap / 2;
        foreach (var x in new[] { BreakX, BreakX + Gap - slant })
            g.DrawLine(Palette.Outline, x, barBottom + below, x + slant, barTop);
    }
}
