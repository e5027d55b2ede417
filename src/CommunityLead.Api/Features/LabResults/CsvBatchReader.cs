using CsvHelper;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// Reads a text/csv batch: a header row in any order and any case, comma or semicolon separated (detected),
/// UTF-8 with or without a byte order mark, decimal point. Batch fields come from the query string.
/// A bad cell becomes a problem naming its line and column; reading goes on so every problem is reported.
/// </summary>
public static class CsvBatchReader
{
    private static readonly string[] Columns =
    [
        "sampleType", "kitCode", "bottle", "position", "location", "analyte", "value", "unit", "qualifier", "mdl",
        "reportingLimit", "uncertainty", "replicates", "acidifiedAt", "expected", "measured", "unspiked", "spikeAdded", "duplicate",
        // The optional run (CsvRunRows): intensities and positions, and the calibration and XRF rows' own columns.
        "intensities", "runOrder", "line", "weighting", "throughBlank", "reference", "certifiedUncertainty",
    ];

    public static async Task<ParsedBatch> ReadAsync(Stream body, IQueryCollection query, CancellationToken ct)
    {
        var problems = new List<BatchProblem>();
        var header = ReadQuery(query, problems);
        var results = new List<ResultRow>();
        var qc = new List<QcRow>();
        var runRows = new CsvRunRows(problems);
        await using var csv = CsvReader.Create(body, new CsvReaderOptions
        {
            TrackLineNumbers = true,
            // Lab exports never need line breaks inside a cell; refusing them means one stray quote spoils one
            // row (reported with its line) instead of silently swallowing the rest of the file.
            AllowLineBreaksInQuotes = false,
        }, leaveOpen: true);
        await csv.ReadHeaderAsync(ct);
        if (csv.Headers.Count == 0)
        {
            problems.Add(new("row 1", "header", "The file is empty; it needs a header row and one row per result."));
            return new ParsedBatch(header, "csv", problems);
        }
        var index = MapColumns(csv.Headers, problems);
        while (await csv.ReadAsync(ct))
        {
            var cells = new CsvCells(csv, index, $"row {csv.LineNumber}", problems);
            var sampleType = cells.Text("sampleType");
            if (sampleType is null || sampleType.Equals("sample", StringComparison.OrdinalIgnoreCase))
                results.Add(cells.Result());
            else if (!runRows.TryAdd(cells, sampleType))
                qc.Add(cells.Qc(sampleType));
        }
        return new ParsedBatch(header with { Results = results, Qc = qc, Run = runRows.Block() }, "csv", problems);
    }

    private static Dictionary<string, int> MapColumns(IReadOnlyList<string> headers, List<BatchProblem> problems)
    {
        var index = new Dictionary<string, int>(StringComparer.OrdinalIgnoreCase);
        for (var i = 0; i < headers.Count; i++)
        {
            var name = headers[i].Trim();
            var known = Columns.FirstOrDefault(c => c.Equals(name, StringComparison.OrdinalIgnoreCase));
            if (known is null)
                problems.Add(new("row 1", name, $"Unknown column. Columns: {string.Join(", ", Columns)}."));
            else if (!index.TryAdd(known, i))
                problems.Add(new("row 1", name, "This column appears twice."));
        }
        return index;
    }

    private static BatchRequest ReadQuery(IQueryCollection query, List<BatchProblem> problems)
    {
        bool? correction = query["correction"].ToString() switch
        {
            "" => null,
            var c when bool.TryParse(c, out var b) => b,
            _ => null,
        };
        if (query["correction"].ToString() is { Length: > 0 } raw && correction is null)
            problems.Add(new("", "correction", "Use correction=true or correction=false."));
        return new BatchRequest(Blank(query["batchId"]), Blank(query["method"]), Blank(query["analyzedAt"]), correction,
            Blank(query["correctionReason"]), [], []);
    }

    private static string? Blank(string? s) => string.IsNullOrWhiteSpace(s) ? null : s.Trim();
}
