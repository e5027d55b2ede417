using CommunityLead.Rules.Calibration;
using CommunityLead.Rules.LabResults;
using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>
/// Intensity against concentration: every replicate of every standard, the fitted line, the calibration checks
/// (drawn at their expected concentration and the intensity their measured value implies), and the samples.
/// </summary>
internal static class CalibrationPlot
{
    /// <param name="upTo">Draw only up to this concentration (the low range); null: the whole run.</param>
    public static void Draw(XGraphics gfx, XRect box, CurveReview curve, RunInput run, string unit, double? upTo)
    {
        var fit = curve.Curve.Fit;
        var standards = curve.Curve.Standards;
        var checks = run.Sequence.Where(p => p.Analyte == curve.Analyte && p.Type == QcType.CalibrationCheck && p.Expected is not null && p.Measured is not null).ToList();
        var samples = Samples(curve, run).ToList();
        var xs = standards.Select(s => s.Nominal).Concat(checks.Select(c => c.Expected!.Value)).Concat(samples.Select(s => s.X)).ToList();
        var xMax = upTo ?? xs.Max();
        var ys = run.Calibrations.First(c => c.Analyte == curve.Analyte).Standards.Where(s => s.Nominal <= xMax).SelectMany(s => s.Intensities)
            .Concat(samples.Where(s => s.X <= xMax).Select(s => s.Y)).Append(fit.Predict(0)).Append(fit.Predict(xMax)).ToList();
        // Concentrations start at zero; a sample the curve reads below zero is clipped here and stays in the table.
        var frame = new PlotFrame(gfx, box, (0, xMax), (Math.Min(0, ys.Min()), ys.Max()));
        frame.DrawAxes(upTo is null
                ? $"Calibration: {QcReportPdf.Name(curve.Analyte)}{(curve.Line is null ? "" : $", {curve.Line}")}"
                : $"Low range, to {upTo:0.##} {unit}",
            $"concentration ({unit})", "intensity (counts)");

        var state = gfx.Save();
        gfx.IntersectClip(box);
        gfx.DrawLine(Marks.Line, frame.At(frame.X.Min, fit.Predict(frame.X.Min)), frame.At(frame.X.Max, fit.Predict(frame.X.Max)));
        // The calibrated range: everything right of the highest standard is extrapolation.
        var edge = frame.At(curve.Curve.Highest, 0);
        gfx.DrawLine(Marks.Window, edge.X, box.Top, edge.X, box.Bottom);
        foreach (var s in run.Calibrations.First(c => c.Analyte == curve.Analyte).Standards)
        {
            foreach (var reading in s.Intensities) Marks.Dot(gfx, frame.At(s.Nominal, reading), Marks.StandardColour, 4.2, filled: false);
            Marks.Dot(gfx, frame.At(s.Nominal, s.Intensities.Average()), Marks.StandardColour);
        }
        foreach (var c in checks) Marks.Triangle(gfx, frame.At(c.Expected!.Value, fit.Predict(c.Measured!.Value)), Marks.CheckColour);
        foreach (var s in samples) Marks.Cross(gfx, frame.At(s.X, s.Y), s.X > curve.Curve.Highest ? Marks.FailColour : Marks.SampleColour);
        gfx.Restore(state);

        if (edge.X <= box.Right)
            gfx.DrawString("highest standard", Letters.Layout.LetterFonts.Shared.Tiny, XBrushes.DimGray,
                new XRect(edge.X - 72, box.Top + 2, 70, 8), XStringFormats.TopRight);
    }

    public static void Legend(XGraphics gfx, double x, double y, CurveReview curve)
    {
        var fit = curve.Curve.Fit;
        Marks.Legend(gfx, x, y,
            ((g, p) => Marks.Dot(g, p, Marks.StandardColour, 4.2, filled: false), "standard replicate"),
            ((g, p) => Marks.Dot(g, p, Marks.StandardColour), "standard mean"),
            ((g, p) => g.DrawLine(Marks.Line, p.X - 4, p.Y, p.X + 4, p.Y), $"fit: y = {fit.Slope:0.###}·x + {fit.Intercept:0.#}, r = {fit.R:0.00000}"),
            ((g, p) => Marks.Triangle(g, p, Marks.CheckColour), "calibration check"),
            ((g, p) => Marks.Cross(g, p, Marks.SampleColour), "sample"),
            ((g, p) => Marks.Cross(g, p, Marks.FailColour), "above range"));
    }

    /// <summary>Samples on the curve: from their intensities where sent, else where their reported value sits on the line.</summary>
    private static IEnumerable<(double X, double Y)> Samples(CurveReview curve, RunInput run)
    {
        foreach (var (sample, concentration) in curve.Computed) yield return (concentration, sample.Intensities!.Average());
        foreach (var s in run.Samples.Where(s => s.Analyte == curve.Analyte && s.Intensities is null && !s.Censored))
            yield return (s.Reported, curve.Curve.Fit.Predict(s.Reported));
    }
}
