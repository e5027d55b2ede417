using System.Text;
using System.Text.Json.Nodes;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;

namespace CommunityLead.Tests.Infrastructure.Fuzz;

/// <summary>What a case sends, and as whom.</summary>
public sealed record FuzzCase(FuzzRoute Route, string Role, HttpMethod Method, string Path, string? Body, string? ContentType)
{
    public HttpRequestMessage Request() => new(Method, Path)
    {
        Content = Body is null ? null : new ByteArrayContent(Encoding.UTF8.GetBytes(Body)) { Headers = { ContentType = new(ContentType!) } },
    };

    /// <summary>For a failure message: enough to send the same request again by hand.</summary>
    public override string ToString() =>
        $"{Method} {Path} [{ContentType}] {(Body is null ? "" : Body.Length > 400 ? Body[..400] + $"… ({Body.Length} chars)" : Body)}";
}

public enum FuzzRoute { SignUp, Collection, LabJson, LabCsv, Mdl, Report }

/// <summary>
/// Seeded request bodies for each fuzzed route: a valid body, changed a little (<see cref="JsonMutator"/>), or for
/// CSV a valid table with a cell, column, row or separator spoiled. Kits come from the test's own setup.
/// </summary>
public sealed class FuzzCases(Random random, FuzzKits kits)
{
    private readonly JsonMutator mutator = new(random);
    private readonly CsvMutator csv = new(random);
    private int batchNumber;

    public FuzzCase SignUp()
    {
        var body = Fixtures.Household();
        // A fifth go in unchanged (they must be accepted); the others are changed.
        var text = random.Next(5) == 0 ? body.ToJsonString() : mutator.Text(mutator.Mutate(body));
        return new(FuzzRoute.SignUp, "coordinator", HttpMethod.Post, "/api/households", text, ContentType());
    }

    public FuzzCase Collection()
    {
        var (code, kind) = kits.ForCollection[random.Next(kits.ForCollection.Count)];
        var body = JsonNode.Parse(System.Text.Json.JsonSerializer.Serialize(kind switch
        {
            "soil" => SoilCollection(),
            "water-sequential" => SequentialCollection(),
            _ => Fixtures.GoodWaterCollection(),
        }, Fixtures.Json))!;
        var text = random.Next(5) == 0 ? body.ToJsonString() : mutator.Text(mutator.Mutate(body));
        var path = random.Next(20) switch
        {
            0 => $"/api/kits/{Mistyped(code)}/collection",
            1 => $"/api/kits/{NeverIssuedCode()}/collection",
            2 => $"/api/kits/{Uri.EscapeDataString(Shortened(JsonMutator.NastyText[random.Next(JsonMutator.NastyText.Length)]))}x/collection",
            _ => $"/api/kits/{code}/collection",
        };
        return new(FuzzRoute.Collection, "coordinator", HttpMethod.Post, path, text, ContentType());
    }

    public FuzzCase LabJson()
    {
        var batch = Batch(NextBatchId("J"), [.. LabRows().Select(r => Result(r.Code, r.Bottle, r.Value))]);
        var text = random.Next(6) == 0 ? batch.ToJsonString() : mutator.Text(mutator.Mutate(batch));
        return new(FuzzRoute.LabJson, "lab", HttpMethod.Post, "/api/lab/batches", text, random.Next(30) == 0 ? "text/plain" : "application/json");
    }

    public FuzzCase LabCsv()
    {
        var rows = new List<string[]> { CsvMutator.Header };
        rows.AddRange(LabRows().Select(r => new[] { "sample", r.Code, r.Bottle, "lead", r.Value.ToString(System.Globalization.CultureInfo.InvariantCulture), "ug/L", "0.3", "1.0", "", "" }));
        rows.Add(["calibration-blank", "", "", "lead", "", "ug/L", "", "", "", "0.04"]);
        rows.Add(["calibration-check", "", "", "lead", "", "ug/L", "", "", "10.0", "10.2"]);
        var query = new Dictionary<string, string> { ["batchId"] = NextBatchId("C"), ["method"] = "EPA 200.8", ["analyzedAt"] = AnalyzedAt };
        var text = random.Next(6) == 0 ? CsvMutator.Write(rows, ',') : csv.Mutate(rows, query);
        var path = "/api/lab/batches?" + string.Join('&', query.Select(q => $"{q.Key}={Uri.EscapeDataString(q.Value)}"));
        return new(FuzzRoute.LabCsv, "lab", HttpMethod.Post, path, text, "text/csv");
    }

    public FuzzCase Mdl()
    {
        var spiked = new JsonArray([.. Enumerable.Range(0, random.Next(7, 12)).Select(_ => (JsonNode?)JsonValue.Create(Math.Round(0.4 + random.NextDouble() / 5, 3)))]);
        var blanks = new JsonArray([.. Enumerable.Range(0, random.Next(3) == 0 ? 0 : random.Next(7, 10)).Select(_ => (JsonNode?)JsonValue.Create(Math.Round(random.NextDouble() / 20, 3)))]);
        var body = new JsonObject { ["spiked"] = spiked, ["blanks"] = blanks };
        var text = random.Next(5) == 0 ? body.ToJsonString() : mutator.Text(mutator.Mutate(body));
        return new(FuzzRoute.Mdl, random.Next(2) == 0 ? "lab" : "coordinator", HttpMethod.Post, "/api/lab/mdl", text, ContentType());
    }

    public FuzzCase Report()
    {
        string[] dates = ["2026-01-01", "2026-03-31", "2026-04-30", "2026-04-15", "9999-12-31", "0001-01-01", "2026-13-01", "2026-02-29",
            "2024-02-29", "1999-12-31", "3000-01-31", "2026-4-1", "", "now", "2026-04-01T00:00:00Z", "99999-01-01"];
        var choices = new Dictionary<string, string[]>
        {
            ["from"] = dates, ["to"] = dates,
            ["groupBy"] = ["area", "month", "quarter", "age-band", "service-line", "band", "Area", "kit", ""],
            ["format"] = ["json", "csv", "CSV", "xml", ""],
            ["areaCode"] = ["riverside", "harbour", "", "%00", "x" + new string('y', 300), "=1+1"],
            ["waterSource"] = ["public", "private-well", "well", "0"],
            ["ageBand"] = ["before-1950", "1950-1985", "1986-and-later", "unknown", "1900"],
            ["serviceLine"] = ["lead", "galvanized", "copper", "plastic", "unknown", "steel"],
            ["extra"] = ["1"],
        };
        var query = choices.Where(_ => random.Next(3) == 0)
            .SelectMany(c => Enumerable.Range(0, random.Next(12) == 0 ? 2 : 1).Select(_ => $"{c.Key}={Uri.EscapeDataString(c.Value[random.Next(c.Value.Length)])}"));
        return new(FuzzRoute.Report, "health", HttpMethod.Get, "/api/reports/summary?" + string.Join('&', query), null, null);
    }

    // The test server cannot carry a NUL in a path (Kestrel answers that 400 before routing), so it is left out there.
    private static string Shortened(string text) => text.Replace("\0", "", StringComparison.Ordinal)[..Math.Min(80, text.Replace("\0", "", StringComparison.Ordinal).Length)];

    private string ContentType() => random.Next(40) == 0 ? "text/plain" : "application/json";

    /// <summary>A fresh id mostly; now and then the previous one again (a replay, or the same id with other content).</summary>
    private string NextBatchId(string format) => random.Next(8) == 0 && batchNumber > 0 ? $"FZ-{format}{batchNumber}" : $"FZ-{format}{++batchNumber}";

    private IEnumerable<(string Code, string Bottle, double Value)> LabRows()
    {
        var code = kits.ForLab[random.Next(kits.ForLab.Count)];
        yield return (code, "first-draw", Math.Round(random.NextDouble() * 30, 1));
        yield return (code, "flushed", Math.Round(random.NextDouble() * 10, 1));
    }

    private static object SequentialCollection() => new
    {
        samples = Enumerable.Range(1, 3).Select(p => new { bottle = "sequential", position = p, volumeMl = 250, collectedAt = $"2026-04-03T06:0{p}:00+00:00", waterLastUsedAt = "2026-04-02T22:00:00+00:00" }).ToArray(),
    };
}

/// <summary>Kits made before the fuzz starts: some still to collect (any kind), some received and waiting for the lab.</summary>
public sealed record FuzzKits(IReadOnlyList<(string Code, string Kind)> ForCollection, IReadOnlyList<string> ForLab);
