using CommunityLead.Rules.Calibration;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>
/// Each standard's residual (mean intensity minus the line) against its concentration. A straight curve scatters
/// them about zero; a bow (low at the ends, high in the middle) is the sign of a curve that is not linear.
/// </summary>
internal static class ResidualPlot
{
    public static void Draw(XGraphics gfx, XRect box, CurveReview curve, string unit)
    {
        var fit = curve.Curve.Fit;
        var points = curve.Curve.Standards.Select((s, i) => (X: s.Nominal, Y: fit.Residuals[i])).ToList();
        var reach = Math.Max(points.Max(p => Math.Abs(p.Y)), fit.ResidualSd) * 1.1;
        var frame = new PlotFrame(gfx, box, (Math.Min(0, points.Min(p => p.X)), points.Max(p => p.X)), (-reach, reach));
        frame.DrawAxes($"Residuals (residual SD {fit.ResidualSd:0.##} counts)", $"concentration ({unit})", "residual (counts)");
        frame.HorizontalLine(0, Marks.Line);
        foreach (var p in points)
        {
            var at = frame.At(p.X, p.Y);
            gfx.DrawLine(new XPen(Marks.StandardColour, 0.8), at, frame.At(p.X, 0));
            Marks.Dot(gfx, at, Marks.StandardColour, 4);
        }
    }
}
