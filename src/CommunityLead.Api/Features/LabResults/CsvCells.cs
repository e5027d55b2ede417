using System.Globalization;
using CommunityLead.Api.Infrastructure;
using CsvHelper;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Typed access to the cells of one CSV row; a cell that doesn't parse is recorded as a problem.</summary>
internal sealed class CsvCells(CsvReader csv, IReadOnlyDictionary<string, int> index, string where, BatchProblemList problems)
{
    private List<string>? unreadable;

    private void Unreadable(string column, string reason)
    {
        problems.Add(new(where, column, reason));
        (unreadable ??= []).Add(column);
    }

    public string Where => where;

    public string? Text(string column)
    {
        if (!index.TryGetValue(column, out var i) || i >= csv.FieldCount) return null;
        var value = csv.GetString(i)?.Trim();
        if (NoNulText.Contains(value))
        {
            Unreadable(column, NoNulText.Message);
            return null;
        }
        return string.IsNullOrEmpty(value) ? null : value;
    }

    public double? Number(string column)
    {
        if (Text(column) is not { } text) return null;
        if (double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value)) return value;
        Unreadable(column, text switch
        {
            // "<1.0" is how a report writes "below the reporting limit of 1.0": the comparison has its own column.
            ['<' or '>', .. var rest] when double.TryParse(rest.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out _) =>
                $"'{text}' is not a number: write the sign in the qualifier column and the number here (qualifier '{text[0]}', {column} {rest.Trim()}).",
            _ when text.Contains(',') => $"'{text}' is not a number; use a decimal point (12.4), not a comma.",
            _ => $"'{text}' is not a number.",
        });
        return null;
    }

    public int? Whole(string column)
    {
        if (Text(column) is not { } text) return null;
        if (int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var value)) return value;
        Unreadable(column, $"'{text}' is not a whole number.");
        return null;
    }

    public IReadOnlyList<double>? Replicates() => Numbers("replicates");

    /// <summary>Several readings in one cell, separated by '|' (or spaces).</summary>
    public IReadOnlyList<double>? Numbers(string column)
    {
        if (Text(column) is not { } text) return null;
        var values = new List<double>();
        foreach (var part in text.Split(['|', ' '], StringSplitOptions.RemoveEmptyEntries))
        {
            if (!double.TryParse(part, NumberStyles.Float, CultureInfo.InvariantCulture, out var v) || !double.IsFinite(v))
            {
                Unreadable(column, $"'{part}' is not a number; separate replicate readings with '|'.");
                return null;
            }
            values.Add(v);
        }
        return values;
    }

    public ResultRow Result() => new(
        Text("kitCode"), Text("bottle"), Whole("position"), Text("location"), Text("analyte"), Number("value"), Text("unit"),
        Text("qualifier"), Number("mdl"), Number("reportingLimit"), Number("uncertainty"), Replicates(), Text("acidifiedAt"))
    { Where = where, Intensities = Numbers("intensities"), RunOrder = Whole("runOrder"), Unreadable = unreadable };

    public QcRow Qc(string sampleType) => new(
        sampleType, Text("analyte"), Number("expected"), Number("measured"), Number("unspiked"), Number("spikeAdded"),
        Number("duplicate"), Text("unit"))
    { Where = where, RunOrder = Whole("runOrder"), Unreadable = unreadable };

    public bool? Flag(string column)
    {
        if (Text(column) is not { } text) return null;
        if (bool.TryParse(text, out var value)) return value;
        Unreadable(column, $"'{text}' is not true or false.");
        return null;
    }

}
