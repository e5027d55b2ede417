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

    /// <summary>
    /// Reads the rows, handing results to <paramref name="onResults"/> a chunk at a time as they are read (so the file
    /// is never held whole) and returning the QC rows, which are few, and how many problems reading itself found.
    /// </summary>
    public static async Task<CsvRows> ReadRowsAsync(Stream body, BatchProblemList problems,
        Func<IReadOnlyList<ResultRow>, Task> onResults, CancellationToken ct)
    {
        var start = problems.Count;
        var foundByOthers = 0;
        var qc = new List<QcRow>();
        var chunk = new List<ResultRow>(BatchChecker.ChunkSize);
        async Task Hand()
        {
            var before = problems.Count;
            await onResults(chunk);
            foundByOthers += problems.Count - before;
            chunk = new List<ResultRow>(BatchChecker.ChunkSize);
        }

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
            return new CsvRows(qc, problems.Count - start, null);
        }
        var index = MapColumns(csv.Headers, problems);
        while (await csv.ReadAsync(ct))
        {
            // A spreadsheet saves an emptied row as its delimiters alone (";;;;"): a blank row, not a result without a kit code.
            if (BlankRow(csv)) continue;
            var cells = new CsvCells(csv, index, $"row {csv.LineNumber}", problems);
            var sampleType = cells.Text("sampleType");
            if (sampleType is null || sampleType.Equals("sample", StringComparison.OrdinalIgnoreCase))
            {
                chunk.Add(cells.Result());
                if (chunk.Count == BatchChecker.ChunkSize) await Hand();
            }
            else if (!runRows.TryAdd(cells, sampleType))
                qc.Add(cells.Qc(sampleType));
        }
        if (chunk.Count > 0) await Hand();
        return new CsvRows(qc, problems.Count - start - foundByOthers, runRows.Block());
    }

    private static Dictionary<string, int> MapColumns(IReadOnlyList<string> headers, BatchProblemList problems)
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

    /// <summary>The batch's own fields, from the query string; results and QC follow in the body.</summary>
    public static BatchRequest ReadQuery(IQueryCollection query, BatchProblemList problems)
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

    private static bool BlankRow(CsvReader csv)
    {
        for (var i = 0; i < csv.FieldCount; i++)
            if (!string.IsNullOrWhiteSpace(csv.GetString(i))) return false;
        return true;
    }

    private static string? Blank(string? s) => string.IsNullOrWhiteSpace(s) ? null : s.Trim();
}

/// <param name="ReadingProblems">Problems found by reading (cells, columns), as against those found by the checks.</param>
public sealed record CsvRows(IReadOnlyList<QcRow> Qc, int ReadingProblems, RunBlock? Run);
