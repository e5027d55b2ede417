using CommunityLead.Rules.Calibration;
using CommunityLead.Rules.LabResults;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>Calibration checks (recovery %) and blanks (concentration) by their position in the run, against their windows.</summary>
internal static class RunOrderPlot
{
    public static bool HasPoints(RunInput run, Analyte analyte) => run.Sequence.Any(p => p.Analyte == analyte && p.RunOrder is not null);

    public static void DrawChecks(XGraphics gfx, XRect box, RunInput run, Analyte analyte, QcWindows w)
    {
        var checks = Positioned(run, analyte, QcType.CalibrationCheck).Where(p => p.Expected > 0)
            .Select(p => (X: (double)p.RunOrder!.Value, Y: p.Measured!.Value / p.Expected!.Value * 100)).ToList();
        var (xMin, xMax) = Positions(run, analyte);
        var ys = checks.Select(c => c.Y).Append(w.CalibrationCheckLowPercent - 2).Append(w.CalibrationCheckHighPercent + 2).ToList();
        var frame = new PlotFrame(gfx, box, (xMin, xMax), (ys.Min(), ys.Max()));
        frame.DrawAxes("Calibration checks in run order", "position in the run", "recovery (%)");
        frame.HorizontalLine(w.CalibrationCheckHighPercent, Marks.Window, $"{w.CalibrationCheckHighPercent:0.#}%");
        frame.HorizontalLine(w.CalibrationCheckLowPercent, Marks.Window, $"{w.CalibrationCheckLowPercent:0.#}%");
        frame.HorizontalLine(100, new XPen(XColors.LightGray, 0.5));
        SampleTicks(gfx, frame, run, analyte);
        Connect(gfx, frame, checks, Marks.CheckColour, y => y < w.CalibrationCheckLowPercent || y > w.CalibrationCheckHighPercent);
    }

    public static void DrawBlanks(XGraphics gfx, XRect box, RunInput run, Analyte analyte, string unit)
    {
        var blanks = Positioned(run, analyte, QcType.CalibrationBlank).Select(p => (X: (double)p.RunOrder!.Value, Y: p.Measured!.Value)).ToList();
        var rl = run.Samples.Where(s => s.Analyte == analyte).Select(s => s.ReportingLimit).DefaultIfEmpty(double.NaN).Min();
        var (xMin, xMax) = Positions(run, analyte);
        var ys = blanks.Select(b => b.Y).Append(0).Append(double.IsNaN(rl) ? 0 : rl * 1.1).ToList();
        var frame = new PlotFrame(gfx, box, (xMin, xMax), (ys.Min(), ys.Max()));
        frame.DrawAxes("Blanks in run order", "position in the run", $"blank ({unit})");
        if (!double.IsNaN(rl)) frame.HorizontalLine(rl, Marks.Window, "reporting limit");
        frame.HorizontalLine(0, new XPen(XColors.LightGray, 0.5));
        SampleTicks(gfx, frame, run, analyte);
        Connect(gfx, frame, blanks, Marks.BlankColour, y => !double.IsNaN(rl) && y >= rl);
    }

    private static void Connect(XGraphics gfx, PlotFrame frame, List<(double X, double Y)> points, XColor colour, Func<double, bool> fails)
    {
        var ordered = points.OrderBy(p => p.X).ToList();
        for (var i = 1; i < ordered.Count; i++)
            gfx.DrawLine(new XPen(XColor.FromArgb(120, colour), 0.7), frame.At(ordered[i - 1].X, ordered[i - 1].Y), frame.At(ordered[i].X, ordered[i].Y));
        foreach (var p in ordered) Marks.Dot(gfx, frame.At(p.X, p.Y), fails(p.Y) ? Marks.FailColour : colour, 4.5);
    }

    /// <summary>Where the samples ran, as small ticks along the bottom, so gaps between checks show.</summary>
    private static void SampleTicks(XGraphics gfx, PlotFrame frame, RunInput run, Analyte analyte)
    {
        var pen = new XPen(Marks.SampleColour, 0.6);
        foreach (var s in run.Samples.Where(s => s.Analyte == analyte && s.RunOrder is not null))
        {
            var p = frame.At(s.RunOrder!.Value, frame.Y.Min);
            gfx.DrawLine(pen, p.X, p.Y, p.X, p.Y - 4);
        }
    }

    private static IEnumerable<RunQcPoint> Positioned(RunInput run, Analyte analyte, QcType type) =>
        run.Sequence.Where(p => p.Analyte == analyte && p.Type == type && p.RunOrder is not null && p.Measured is not null);

    private static (double, double) Positions(RunInput run, Analyte analyte)
    {
        var all = run.Sequence.Where(p => p.Analyte == analyte).Select(p => p.RunOrder)
            .Concat(run.Samples.Where(s => s.Analyte == analyte).Select(s => s.RunOrder)).OfType<int>().ToList();
        return all.Count == 0 ? (0, 1) : (Math.Max(0, all.Min() - 1), all.Max() + 1);
    }
}
