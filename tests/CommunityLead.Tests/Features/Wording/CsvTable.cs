using System.Text;

namespace CommunityLead.Tests.Features.Wording;

/// <summary>A small RFC 4180 reader (quoted cells, doubled quotes, line breaks inside quotes), to read exports back.</summary>
internal static class CsvTable
{
    public static List<Dictionary<string, string>> Read(string text)
    {
        var rows = Rows(text);
        var header = rows[0];
        return [.. rows.Skip(1).Select(r =>
        {
            Assert.Equal(header.Count, r.Count);
            return header.Zip(r).ToDictionary(p => p.First, p => p.Second);
        })];
    }

    private static List<List<string>> Rows(string text)
    {
        var rows = new List<List<string>>();
        var row = new List<string>();
        var cell = new StringBuilder();
        var quoted = false;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (quoted)
            {
                if (c == '"' && i + 1 < text.Length && text[i + 1] == '"') { cell.Append('"'); i++; }
                else if (c == '"') quoted = false;
                else cell.Append(c);
            }
            else if (c == '"') quoted = true;
            else if (c == ',') { row.Add(cell.ToString()); cell.Clear(); }
            else if (c == '\n') { row.Add(cell.ToString()); cell.Clear(); rows.Add(row); row = []; }
            else cell.Append(c);
        }
        if (cell.Length > 0 || row.Count > 0) { row.Add(cell.ToString()); rows.Add(row); }
        return rows;
    }
}
