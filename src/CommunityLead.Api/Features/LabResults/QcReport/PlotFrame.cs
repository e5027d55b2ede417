using System.Globalization;
using CommunityLead.Api.Features.Letters.Layout;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>A chart's box: data ranges mapped onto a rectangle, with ticked and labelled axes.</summary>
internal sealed class PlotFrame
{
    private static readonly XPen Axis = new(XColors.Black, 0.6);
    private static readonly XPen Grid = new(XColor.FromArgb(225, 225, 225), 0.4);
    private readonly XGraphics gfx;

    public PlotFrame(XGraphics gfx, XRect box, (double Min, double Max) x, (double Min, double Max) y)
    {
        this.gfx = gfx;
        Box = box;
        X = Nice(x.Min, x.Max);
        Y = Nice(y.Min, y.Max);
    }

    public XRect Box { get; }
    public (double Min, double Max, double Step) X { get; }
    public (double Min, double Max, double Step) Y { get; }

    public XPoint At(double x, double y) => new(
        Box.Left + (x - X.Min) / (X.Max - X.Min) * Box.Width,
        Box.Bottom - (y - Y.Min) / (Y.Max - Y.Min) * Box.Height);

    /// <summary>Whether a point falls inside the ranges (points outside are drawn at the edge by the caller, or left out).</summary>
    public bool Holds(double x, double y) => x >= X.Min && x <= X.Max && y >= Y.Min && y <= Y.Max;

    public void DrawAxes(string title, string xLabel, string yLabel)
    {
        var fonts = LetterFonts.Shared;
        for (var v = X.Min; v <= X.Max + X.Step / 2; v += X.Step)
        {
            var p = At(v, Y.Min);
            gfx.DrawLine(Grid, p.X, Box.Top, p.X, Box.Bottom);
            gfx.DrawLine(Axis, p.X, Box.Bottom, p.X, Box.Bottom + 3);
            gfx.DrawString(Tick(v, X.Step), fonts.Tiny, XBrushes.Black, new XRect(p.X - 30, Box.Bottom + 4, 60, 9), XStringFormats.TopCenter);
        }
        for (var v = Y.Min; v <= Y.Max + Y.Step / 2; v += Y.Step)
        {
            var p = At(X.Min, v);
            gfx.DrawLine(Grid, Box.Left, p.Y, Box.Right, p.Y);
            gfx.DrawLine(Axis, Box.Left - 3, p.Y, Box.Left, p.Y);
            gfx.DrawString(Tick(v, Y.Step), fonts.Tiny, XBrushes.Black, new XRect(Box.Left - 64, p.Y - 4.5, 60, 9), XStringFormats.CenterRight);
        }
        gfx.DrawRectangle(Axis, Box);
        gfx.DrawString(title, fonts.BodyBold, XBrushes.Black, new XRect(Box.Left, Box.Top - 15, Box.Width, 12), XStringFormats.TopLeft);
        gfx.DrawString(xLabel, fonts.Small, XBrushes.Black, new XRect(Box.Left, Box.Bottom + 14, Box.Width, 10), XStringFormats.TopCenter);
        var state = gfx.Save();
        var centre = new XPoint(Box.Left - 52, Box.Top + Box.Height / 2);
        gfx.RotateAtTransform(-90, centre);
        gfx.DrawString(yLabel, fonts.Small, XBrushes.Black, new XRect(centre.X - Box.Height / 2, centre.Y - 5, Box.Height, 10), XStringFormats.Center);
        gfx.Restore(state);
    }

    /// <summary>A horizontal reference line across the plot (a window's edge, zero), labelled at its right end.</summary>
    public void HorizontalLine(double y, XPen pen, string? label = null)
    {
        if (y < Y.Min || y > Y.Max) return;
        var p = At(X.Min, y);
        gfx.DrawLine(pen, Box.Left, p.Y, Box.Right, p.Y);
        if (label is not null)
            gfx.DrawString(label, LetterFonts.Shared.Tiny, XBrushes.DimGray, new XRect(Box.Right - 122, p.Y - 9, 120, 8), XStringFormats.BottomRight);
    }

    /// <summary>Round axis ends and a 1-2-5 step giving about five intervals.</summary>
    internal static (double Min, double Max, double Step) Nice(double min, double max)
    {
        if (!(max > min)) (min, max) = (min - 1, max + 1);
        var raw = (max - min) / 5;
        var magnitude = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        var step = new[] { 1, 2, 2.5, 5, 10 }.Select(m => m * magnitude).First(s => s >= raw);
        return (Math.Floor(min / step) * step, Math.Ceiling(max / step) * step, step);
    }

    private static string Tick(double value, double step)
    {
        var decimals = Math.Max(0, -(int)Math.Floor(Math.Log10(step) + 1e-9));
        return Math.Round(value, decimals + 1).ToString("#,0." + new string('#', decimals + 1), CultureInfo.InvariantCulture);
    }
}
