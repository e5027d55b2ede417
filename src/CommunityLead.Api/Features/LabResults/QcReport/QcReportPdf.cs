using System.Globalization;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Letters.Layout;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.LabResults;
using PdfSharp;
using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace CommunityLead.Api.Features.LabResults.QcReport;

/// <summary>
/// The QC report on A4, drawn with PDFsharp and the letters' fonts: a page per analyte with its calibration,
/// residuals and run-order charts, then the table of every figure with its verdict.
/// </summary>
internal static class QcReportPdf
{
    private const double Margin = 40;

    public static byte[] Render(QcReportContent report)
    {
        using var document = new PdfDocument();
        document.Info.Title = $"QC report — batch {report.BatchId}, version {report.Version}";
        document.Info.Creator = "CommunityLead";
        var analytes = report.Review?.Curves.Select(c => c.Analyte)
            .Union(report.Run!.Sequence.Where(p => p.RunOrder is not null).Select(p => p.Analyte)).OrderBy(a => a).ToList() ?? [];
        var open = new List<XGraphics>();
        var page = 0;
        foreach (var analyte in analytes)
            AnalytePage(Track(open, NewPage(document, report, ++page)), report, analyte);
        var next = 0;
        do
        {
            var gfx = Track(open, NewPage(document, report, ++page));
            var top = page == 1 ? 170 : 100;
            gfx.DrawString("Every figure and its verdict", LetterFonts.Shared.Heading, XBrushes.Black, new XPoint(Margin, top - 8));
            next = FigureTable.Draw(gfx, new XRect(Margin, top, 515, 842 - Margin - 20 - top), report.Verdict.Checks, next);
        }
        while (next < report.Verdict.Checks.Count);
        foreach (var gfx in open) gfx.Dispose();
        using var stream = new MemoryStream();
        document.Save(stream);
        return stream.ToArray();
    }

    /// <summary>Up to the second-highest standard, with room: where the low standards and most samples can be told apart.</summary>
    private static double LowRange(Rules.Calibration.CurveReview curve)
    {
        var levels = curve.Curve.Standards.Select(s => s.Nominal).Where(n => n > 0).OrderDescending().ToList();
        return levels.Count >= 2 ? levels[1] * 1.5 : curve.Curve.Highest;
    }

    private static XGraphics Track(List<XGraphics> open, XGraphics gfx)
    {
        open.Add(gfx);
        return gfx;
    }

    internal static string Name(Analyte analyte) => analyte == Analyte.Lead ? "lead (Pb)" : "copper (Cu)";

    private static void AnalytePage(XGraphics gfx, QcReportContent report, Analyte analyte)
    {
        var unit = Analytes.NormalUnit(analyte, Matrix.Water);
        var curve = report.Review!.Curves.FirstOrDefault(c => c.Analyte == analyte);
        var top = 200.0;
        if (curve is not null)
        {
            // Standards usually span two decades: the whole range squeezes the low end, where most samples sit, into a
            // corner, so the low range is drawn again beside it.
            CalibrationPlot.Draw(gfx, new XRect(Margin + 52, top, 200, 210), curve, report.Run!, unit, upTo: null);
            CalibrationPlot.Draw(gfx, new XRect(Margin + 52 + 200 + 62, top, 201, 210), curve, report.Run!, unit, upTo: LowRange(curve));
            CalibrationPlot.Legend(gfx, Margin + 52, top + 236, curve);
            top += 210 + 70;
            ResidualPlot.Draw(gfx, new XRect(Margin + 62, top, 515 - 62, 110), curve, unit);
            top += 110 + 50;
        }
        if (RunOrderPlot.HasPoints(report.Run!, analyte))
        {
            RunOrderPlot.DrawChecks(gfx, new XRect(Margin + 62, top, 180, 110), report.Run!, analyte, report.Windows);
            RunOrderPlot.DrawBlanks(gfx, new XRect(Margin + 62 + 180 + 74, top, 199, 110), report.Run!, analyte, unit);
        }
    }

    /// <summary>A page with the batch's heading; the first page also says what the report is and what the verdict was.</summary>
    private static XGraphics NewPage(PdfDocument document, QcReportContent report, int number)
    {
        var page = document.AddPage();
        page.Size = PageSize.A4;
        var gfx = XGraphics.FromPdfPage(page);
        var fonts = LetterFonts.Shared;
        gfx.DrawString($"QC report · batch {report.BatchId} · version {report.Version}", fonts.Title, XBrushes.Black, new XPoint(Margin, 52));
        gfx.DrawString($"{report.Method} · analysed {report.AnalyzedAt.ToString("yyyy-MM-dd HH:mm zzz", CultureInfo.InvariantCulture)} · page {number}",
            fonts.Small, XBrushes.DimGray, new XPoint(Margin, 66));
        if (number == 1)
        {
            var failed = report.Verdict.Checks.Count(c => !c.Passed);
            var (verdict, brush) = failed == 0
                ? ($"QC passed: all {report.Verdict.Checks.Count} checks within their windows. Batch {KebabEnum.Name(report.Status)}.", XBrushes.Black)
                : ($"QC failed: {failed} of {report.Verdict.Checks.Count} checks outside their windows. Batch {KebabEnum.Name(report.Status)}.",
                    (XBrush)new XSolidBrush(Marks.FailColour));
            gfx.DrawString(verdict, fonts.BodyBold, brush, new XPoint(Margin, 92));
            string[] notes =
            [
                "CommunityLead computed these figures itself from the lab's own readings (least squares over each standard's mean intensity),",
                "and judged them against the program's windows (setting LabIntake:Qc). A held batch reaches no household letter until the lab",
                "sends a correction or a coordinator releases it with a reason. This report checks the run's arithmetic and consistency; it does",
                "not replace the lab's own quality system, an accreditation body's audit, or the judgement of the local health department.",
            ];
            for (var i = 0; i < notes.Length; i++) gfx.DrawString(notes[i], fonts.Small, XBrushes.Black, new XPoint(Margin, 110 + i * 11));
        }
        gfx.DrawLine(new XPen(XColors.Gray, 0.5), Margin, 842 - Margin, 595 - Margin, 842 - Margin);
        gfx.DrawString("Figures: the service's; windows: LabIntake:Qc as now set. Invented readings in demo batches.", fonts.Tiny, XBrushes.DimGray,
            new XPoint(Margin, 842 - Margin + 10));
        return gfx;
    }
}
