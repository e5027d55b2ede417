using System.Globalization;
using System.Text;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Api.Features.Wording;

/// <summary>
/// The catalogue as text/csv for a spreadsheet: one row per entry, the version on every row so a sheet cut apart
/// still says which wording it is. Text cells are escaped as in the health reports (formula characters neutralised).
/// </summary>
public static class WordingCsv
{
    private static readonly string[] Header =
    [
        "code", "origin", "usedWhen", "en", "es", "exampleEn", "exampleEs", "marker", "source",
        "englishGrade", "englishReadingEase", "spanishPerspicuity", "spanishBand", "catalogueVersion",
    ];

    public static string Write(WordingExport export)
    {
        var text = new StringBuilder();
        Line(text, Header.Select(SummaryCsv.Escape));
        foreach (var e in export.Entries)
        {
            var words = new[] { e.Code, e.Origin, e.UsedWhen, e.En, e.Es, e.ExampleEn ?? "", e.ExampleEs ?? "", KebabEnum.Name(e.Marker), e.Source };
            // Scores are our own numbers, not text from anyone: written plain, so a negative grade stays a number.
            var scores = e.Reading is { } r
                ? new[] { Number(r.EnglishGrade), Number(r.EnglishReadingEase), Number(r.SpanishPerspicuity), KebabEnum.Name(r.SpanishBand) }
                : ["", "", "", ""];
            Line(text, [.. words.Select(SummaryCsv.Escape), .. scores, SummaryCsv.Escape(export.Version)]);
        }
        return text.ToString();
    }

    private static string Number(double value) => value.ToString("0.0", CultureInfo.InvariantCulture);

    private static void Line(StringBuilder text, IEnumerable<string> cells) => text.Append(string.Join(',', cells)).Append('\n');
}
