using System.Globalization;
using System.Security;
using System.Text;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// The summary drawn as SVG on the server, from the same <see cref="SummaryReport"/> the JSON and CSV carry:
/// lead bands per group as stacked bars, and the share at or above the action level with its 95% interval.
/// A group with a hidden count is drawn as a hatched box saying so, never as a zero-length bar. Presentation
/// attributes only (no style attributes or elements), so the page's CSP holds when the SVG is placed in it.
/// </summary>
public static class SummaryChart
{
    private const int Width = 760, Left = 170, Right = 30, Top = 56, RowHeight = 34, BarHeight = 20;
    private const string Ink = "#1f2a2c", Muted = "#4a5557";

    /// <summary>Band colours from pale to dark so they read in order, and apart without colour (legend order).</summary>
    private static readonly string[] BandColours = ["#d9e8ea", "#9cc5cb", "#e2b65b", "#c0612b", "#8f1d1d"];

    public static string LeadBands(SummaryReport report, bool spanish)
    {
        string[] names = spanish
            ? ["No detectado", "Bajo", "Consultivo", "Nivel de acción", "Urgente"]
            : ["Not detected", "Low", "Advisory", "Action level", "Urgent"];
        var rows = report.Rows;
        var svg = Start("lead-bands", rows.Count, spanish ? "Plomo en el agua: hogares por banda y grupo" : "Lead in water: homes by band and group",
            spanish ? "Barras apiladas por grupo. Un grupo con un número oculto se muestra rayado, no como cero." : "Stacked bars per group. A group with a hidden count is shown hatched, never as zero.");
        var most = rows.Select(r => Cells(r.Lead).Sum(c => c.Value ?? 0)).DefaultIfEmpty(0).Max();
        var scale = (Width - Left - Right) / (double)Math.Max(1, most);
        for (var i = 0; i < rows.Count; i++)
        {
            var y = Top + i * RowHeight;
            var cells = Cells(rows[i].Lead);
            Label(svg, rows[i].Group, y);
            if (rows[i].Suppressed || cells.Any(c => c.Suppressed))
            {
                Hidden(svg, "lead-bands", y, spanish ? "oculto: pocos hogares" : "hidden: too few homes");
                continue;
            }
            var x = (double)Left;
            for (var b = 0; b < cells.Length; b++)
            {
                var w = cells[b].Value!.Value * scale;
                if (w <= 0) continue;
                svg.Append(Invariant($"<rect x=\"{x:0.#}\" y=\"{y:0.#}\" width=\"{w:0.#}\" height=\"{BarHeight}\" fill=\"{BandColours[b]}\" stroke=\"#ffffff\"><title>{Escape(rows[i].Group)}: {Escape(names[b])} {cells[b].Value}</title></rect>"));
                x += w;
            }
            Text(svg, x + 6, y + 15, cells.Sum(c => c.Value!.Value).ToString(CultureInfo.InvariantCulture), Muted);
        }
        Legend(svg, names, rows.Count);
        return End(svg);
    }

    public static string ShareAtActionLevel(SummaryReport report, bool spanish)
    {
        var rows = report.Rows;
        var svg = Start("share", rows.Count, spanish ? "Proporción en el nivel de acción o por encima, con intervalo de 95 %" : "Share at or above the action level, with its 95% interval",
            spanish ? "Punto: proporción; línea: intervalo de Wilson. Un grupo oculto se muestra rayado." : "Dot: share; line: Wilson interval. A hidden group is shown hatched.");
        var span = Width - Left - Right;
        for (var t = 0; t <= 100; t += 25)
        {
            var x = Left + span * t / 100.0;
            svg.Append(Invariant($"<line x1=\"{x:0.#}\" y1=\"{Top - 8}\" x2=\"{x:0.#}\" y2=\"{Top + rows.Count * RowHeight}\" stroke=\"#c9c1b1\"/>"));
            Text(svg, x - 10, Top - 12, $"{t} %", Muted);
        }
        for (var i = 0; i < rows.Count; i++)
        {
            var y = Top + i * RowHeight;
            Label(svg, rows[i].Group, y);
            if (rows[i].ShareAtOrAboveActionLevel is not { } share)
            {
                Hidden(svg, "share", y, spanish ? "oculto: pocos hogares" : "hidden: too few homes");
                continue;
            }
            double X(double p) => Left + span * p;
            var mid = y + BarHeight / 2.0;
            svg.Append(Invariant($"<line x1=\"{X(share.Low95):0.#}\" y1=\"{mid}\" x2=\"{X(share.High95):0.#}\" y2=\"{mid}\" stroke=\"{Ink}\" stroke-width=\"3\"/>"));
            svg.Append(Invariant($"<circle cx=\"{X(share.Proportion):0.#}\" cy=\"{mid}\" r=\"6\" fill=\"#c0612b\" stroke=\"{Ink}\"><title>{Escape(rows[i].Group)}: {share.Proportion:P0} ({share.Low95:P0}–{share.High95:P0}), n = {share.Of}</title></circle>"));
            Text(svg, Math.Min(X(share.High95) + 8, Width - 70), mid + 5, Invariant($"{share.Proportion * 100:0} % (n={share.Of})"), Muted);
        }
        return End(svg);
    }

    private static Cell[] Cells(BandCells b) => [b.NotDetected, b.Low, b.Advisory, b.Action, b.Urgent];

    private static StringBuilder Start(string id, int rows, string title, string description)
    {
        var height = Top + rows * RowHeight + 50;
        var svg = new StringBuilder(Invariant(
            $"<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 {Width} {height}\" width=\"{Width}\" height=\"{height}\" role=\"img\" aria-labelledby=\"{id}-title {id}-desc\" font-family=\"system-ui, sans-serif\" font-size=\"13\">"));
        svg.Append($"<title id=\"{id}-title\">{Escape(title)}</title><desc id=\"{id}-desc\">{Escape(description)}</desc>");
        svg.Append($"<defs><pattern id=\"{id}-hatch\" width=\"8\" height=\"8\" patternUnits=\"userSpaceOnUse\" patternTransform=\"rotate(45)\">" +
                   "<rect width=\"8\" height=\"8\" fill=\"#f1ede4\"/><line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"8\" stroke=\"#8a8478\" stroke-width=\"3\"/></pattern></defs>");
        svg.Append(Invariant($"<rect width=\"{Width}\" height=\"{height}\" fill=\"#ffffff\"/>"));
        Text(svg, 12, 24, title, Ink, bold: true);
        return svg;
    }

    private static void Label(StringBuilder svg, string group, double y) =>
        svg.Append(Invariant($"<text x=\"{Left - 8}\" y=\"{y + 15:0.#}\" text-anchor=\"end\" fill=\"{Ink}\">{Escape(group)}</text>"));

    private static void Hidden(StringBuilder svg, string id, double y, string words)
    {
        svg.Append(Invariant($"<rect x=\"{Left}\" y=\"{y:0.#}\" width=\"180\" height=\"{BarHeight}\" fill=\"url(#{id}-hatch)\" stroke=\"#8a8478\"/>"));
        Text(svg, Left + 188, y + 15, words, Ink, italic: true);
    }

    private static void Legend(StringBuilder svg, string[] names, int rows)
    {
        var x = (double)Left;
        var y = Top + rows * RowHeight + 14;
        for (var b = 0; b < names.Length; b++)
        {
            svg.Append(Invariant($"<rect x=\"{x:0.#}\" y=\"{y}\" width=\"14\" height=\"14\" fill=\"{BandColours[b]}\" stroke=\"{Muted}\"/>"));
            Text(svg, x + 18, y + 12, names[b], Ink);
            x += 26 + names[b].Length * 7.2;
        }
    }

    private static void Text(StringBuilder svg, double x, double y, string words, string fill, bool bold = false, bool italic = false) =>
        svg.Append(Invariant($"<text x=\"{x:0.#}\" y=\"{y:0.#}\" fill=\"{fill}\"{(bold ? " font-weight=\"700\" font-size=\"15\"" : "")}{(italic ? " font-style=\"italic\"" : "")}>{Escape(words)}</text>"));

    private static string End(StringBuilder svg) => svg.Append("</svg>").ToString();

    private static string Escape(string s) => SecurityElement.Escape(s);

    private static string Invariant(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
