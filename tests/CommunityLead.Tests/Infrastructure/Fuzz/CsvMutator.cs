using System.Text;

namespace CommunityLead.Tests.Infrastructure.Fuzz;

/// <summary>
/// Spoils a valid CSV batch the ways exports go wrong: a nasty cell, a lost or doubled column, an unknown one, a
/// dropped or repeated row, a stray quote, the other separator, a missing header, and bad query values.
/// </summary>
public sealed class CsvMutator(Random random)
{
    public static readonly string[] Header =
        ["sampleType", "kitCode", "bottle", "analyte", "value", "unit", "mdl", "reportingLimit", "expected", "measured"];

    public string Mutate(List<string[]> rows, Dictionary<string, string> query)
    {
        rows = [.. rows.Select(r => (string[])r.Clone())];
        var separator = random.Next(4) == 0 ? ';' : ',';
        var prefix = "";
        for (var step = random.Next(1, 4); step > 0; step--)
        {
            var row = rows[random.Next(rows.Count)];
            var column = random.Next(row.Length);
            switch (random.Next(10))
            {
                case 0:
                    rows = [.. rows.Select(r => r.Where((_, i) => i != column).ToArray())];
                    break;
                case 1:
                    rows = [.. rows.Select((r, n) => r.Append(n == 0 ? (random.Next(2) == 0 ? "colour" : Header[column]) : "x").ToArray())];
                    break;
                case 2 when rows.Count > 1:
                    rows.RemoveAt(random.Next(rows.Count));
                    break;
                case 3:
                    rows.Insert(random.Next(1, rows.Count + 1), (string[])row.Clone());
                    break;
                case 4:
                    row[column] = "\"" + row[column];
                    break;
                case 5:
                    query[new[] { "batchId", "method", "analyzedAt", "correction", "correctionReason" }[random.Next(5)]] =
                        JsonMutator.NastyText[random.Next(JsonMutator.NastyText.Length)];
                    break;
                case 6:
                    query.Remove(new[] { "batchId", "method", "analyzedAt" }[random.Next(3)]);
                    break;
                case 7:
                    prefix = random.Next(2) == 0 ? "\uFEFF" : "\r\n";
                    break;
                default:
                    row[column] = Quoted(JsonMutator.NastyText[random.Next(JsonMutator.NastyText.Length)], separator);
                    break;
            }
        }
        return prefix + Write(rows, separator);
    }

    public static string Write(IEnumerable<string[]> rows, char separator)
    {
        var text = new StringBuilder();
        foreach (var row in rows) text.Append(string.Join(separator, row)).Append("\r\n");
        return text.ToString();
    }

    /// <summary>Usually quoted as CSV asks when the text holds a separator, a quote or a line break; now and then not.</summary>
    private string Quoted(string text, char separator) =>
        random.Next(4) != 0 && text.IndexOfAny([separator, '"', '\r', '\n']) >= 0 ? $"\"{text.Replace("\"", "\"\"")}\"" : text;
}
