using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>The marks and colours the report's charts share, so the legend means the same thing on every chart.</summary>
internal static class Marks
{
    public static readonly XColor StandardColour = XColor.FromArgb(31, 90, 160);
    public static readonly XColor CheckColour = XColor.FromArgb(214, 120, 0);
    public static readonly XColor SampleColour = XColor.FromArgb(40, 140, 70);
    public static readonly XColor FailColour = XColor.FromArgb(200, 30, 30);
    public static readonly XColor BlankColour = XColor.FromArgb(110, 70, 160);
    public static readonly XPen Line = new(XColor.FromArgb(60, 60, 60), 1);
    public static readonly XPen Window = new(XColor.FromArgb(150, 150, 150), 0.7) { DashStyle = XDashStyle.Dash };

    public static void Dot(XGraphics gfx, XPoint p, XColor colour, double size = 3.2, bool filled = true)
    {
        var rect = new XRect(p.X - size / 2, p.Y - size / 2, size, size);
        if (filled) gfx.DrawEllipse(new XSolidBrush(colour), rect);
        else gfx.DrawEllipse(new XPen(colour, 0.6), rect);
    }

    public static void Triangle(XGraphics gfx, XPoint p, XColor colour, double size = 5) =>
        gfx.DrawPolygon(new XPen(colour, 0.8), new XSolidBrush(XColor.FromArgb(90, colour)),
            [new(p.X, p.Y - size / 1.6), new(p.X - size / 2, p.Y + size / 2.6), new(p.X + size / 2, p.Y + size / 2.6)], XFillMode.Winding);

    public static void Cross(XGraphics gfx, XPoint p, XColor colour, double size = 4)
    {
        var pen = new XPen(colour, 0.9);
        gfx.DrawLine(pen, p.X - size / 2, p.Y - size / 2, p.X + size / 2, p.Y + size / 2);
        gfx.DrawLine(pen, p.X - size / 2, p.Y + size / 2, p.X + size / 2, p.Y - size / 2);
    }

    /// <summary>A row of legend entries under a chart.</summary>
    public static void Legend(XGraphics gfx, double x, double y, params (Action<XGraphics, XPoint> Mark, string Text)[] entries)
    {
        var font = Letters.Layout.LetterFonts.Shared.Tiny;
        foreach (var (mark, text) in entries)
        {
            mark(gfx, new XPoint(x + 3, y + 4));
            gfx.DrawString(text, font, XBrushes.Black, new XPoint(x + 9, y + 6.5));
            x += 14 + gfx.MeasureString(text, font).Width;
        }
    }
}
