using System.Net;
using System.Text;
using System.Text.Json.Nodes;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// Received kits and batch bodies for the lab-results tests. Water kits are collected on the morning of
/// 2026-04-03 UTC (<see cref="Fixtures.GoodWaterCollection"/>), received 2026-04-04, analysed 2026-04-08.
/// </summary>
internal static class LabFixtures
{
    public const string AnalyzedAt = "2026-04-08T14:30:00-05:00";

    public static async Task<string> ReceivedKitAsync(HttpClient coordinator, HttpClient lab, string kind = "water", object? collection = null)
    {
        var code = await IssueKitAsync(coordinator, kind: kind);
        await PostAsync(coordinator, $"/api/kits/{code}/collection", collection ?? (kind == "soil" ? SoilCollection() : GoodWaterCollection()),
            HttpStatusCode.OK);
        await PostAsync(lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
        return code;
    }

    public static object SoilCollection() => new
    {
        samples = new object[]
        {
            new { bottle = "soil", location = "play-area", collectedAt = "2026-04-03T14:00:00-05:00" },
            new { bottle = "soil", location = "garden", collectedAt = "2026-04-03T14:05:00-05:00" },
        },
    };

    /// <summary>A valid code that no kit in the test database has (its check character is right).</summary>
    public static string NeverIssuedCode() => $"ZZZZ-ZZZZ-{KitCode.CheckSymbol("ZZZZZZZZ")}";

    /// <summary>The same code with a wrong check character, as if one key was mistyped.</summary>
    public static string Mistyped(string code) => code[..^1] + (code[^1] == 'A' ? 'B' : 'A');

    public static JsonObject Batch(string batchId, JsonObject[] results, JsonObject[]? qc = null, string analyzedAt = AnalyzedAt,
        string method = "EPA 200.8") => new()
    {
        ["batchId"] = batchId, ["method"] = method, ["analyzedAt"] = analyzedAt,
        ["results"] = new JsonArray([.. results]), ["qc"] = new JsonArray([.. qc ?? LeadQc()]),
    };

    public static JsonObject Result(string kit, string bottle, double value, string unit = "ug/L", string analyte = "lead",
        double mdl = 0.3, double reportingLimit = 1.0) => new()
    {
        ["kitCode"] = kit, ["bottle"] = bottle, ["analyte"] = analyte, ["value"] = value, ["unit"] = unit,
        ["mdl"] = mdl, ["reportingLimit"] = reportingLimit,
    };

    /// <summary>Lead first draw and flushed bottle of one kit.</summary>
    public static JsonObject[] BothBottles(string kit, double firstDraw = 12.4, double flushed = 3.1) =>
        [Result(kit, "first-draw", firstDraw), Result(kit, "flushed", flushed)];

    /// <summary>A calibration blank and one calibration check that pass for up to 10 lead samples (RL 1.0 µg/L).</summary>
    public static JsonObject[] LeadQc() => [Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 10.2, expected: 10.0)];

    public static JsonObject Qc(string type, double measured, double? expected = null, string analyte = "lead", string unit = "ug/L",
        double? unspiked = null, double? spikeAdded = null, double? duplicate = null)
    {
        var qc = new JsonObject { ["type"] = type, ["analyte"] = analyte, ["measured"] = measured, ["unit"] = unit };
        if (expected is { } e) qc["expected"] = e;
        if (unspiked is { } u) qc["unspiked"] = u;
        if (spikeAdded is { } s) qc["spikeAdded"] = s;
        if (duplicate is { } d) qc["duplicate"] = d;
        return qc;
    }

    public static Task<JsonObject> PostBatchAsync(HttpClient lab, JsonObject batch, HttpStatusCode expected) =>
        PostAsync(lab, "/api/lab/batches", batch, expected);

    public static string Query(string batchId, string analyzedAt = AnalyzedAt, string method = "EPA 200.8") =>
        $"batchId={Uri.EscapeDataString(batchId)}&method={Uri.EscapeDataString(method)}&analyzedAt={Uri.EscapeDataString(analyzedAt)}";

    public static Task<HttpResponseMessage> PostCsvAsync(HttpClient lab, string query, string csv, bool bom = false)
    {
        byte[] bytes = [.. bom ? Encoding.UTF8.GetPreamble() : [], .. Encoding.UTF8.GetBytes(csv)];
        var content = new ByteArrayContent(bytes);
        content.Headers.ContentType = new("text/csv") { CharSet = "utf-8" };
        return lab.PostAsync($"/api/lab/batches?{query}", content);
    }

    public static async Task<JsonObject> ReadAsync(HttpResponseMessage response, HttpStatusCode expected)
    {
        await Expect(response, expected);
        return JsonNode.Parse(await response.Content.ReadAsStringAsync())!.AsObject();
    }

    public static async Task<JsonArray> GetArrayAsync(HttpClient client, string path)
    {
        var response = await client.GetAsync(path);
        await Expect(response, HttpStatusCode.OK);
        return JsonNode.Parse(await response.Content.ReadAsStringAsync())!.AsArray();
    }

    public static async Task<string> KitStateAsync(HttpClient client, string code) =>
        (await GetAsync(client, $"/api/kits/{code}"))["state"]!.GetValue<string>();

    /// <summary>
    /// The kit's results are in effect: its latest results move took it to analyzed, and it is there still
    /// (or already interpreted, the one step that may follow by itself).
    /// </summary>
    public static async Task<JsonObject> AssertAnalyzedAsync(HttpClient client, string code)
    {
        var kit = await GetAsync(client, $"/api/kits/{code}");
        var moves = kit["history"]!.AsArray().Where(h => h!["action"]!.GetValue<string>() == "record-results").ToList();
        Assert.NotEmpty(moves);
        Assert.Equal("analyzed", moves[^1]!["to"]!.GetValue<string>());
        Assert.Contains(kit["state"]!.GetValue<string>(), (string[])["analyzed", "interpreted"]);
        return moves[^1]!.AsObject();
    }

    /// <summary>The one QC check of a type in an outcome; type null is the batch-wide count of calibration checks.</summary>
    public static JsonObject QcCheck(JsonObject outcome, string? type) =>
        Assert.Single(outcome["qc"]!["checks"]!.AsArray(), c => c!["type"]?.GetValue<string>() == type)!.AsObject();

    public static void AssertQcCheck(JsonObject check, string figure, double value, double? low, double? high, bool passed)
    {
        Assert.Equal(figure, check["figure"]!.GetValue<string>());
        Assert.Equal(value, check["value"]!.GetValue<double>(), 4);
        Assert.Equal(low, check["low"]?.GetValue<double>());
        Assert.Equal(high, check["high"]?.GetValue<double>());
        Assert.Equal(passed, check["passed"]!.GetValue<bool>());
    }

    /// <summary>Everything a batch post could write, so a refused post can be shown to have written nothing.</summary>
    public static Footprint FootprintOf(CommunityLeadFactory app) => app.WithDb(db => new Footprint(
        db.LabBatches.Count(), db.LabResults.Count(), db.LabQc.Count(), db.AuditTrail.Count(), db.Attention.Count(),
        string.Join(", ", db.Kits.OrderBy(k => k.Id).Select(k => new { k.Code, k.State, k.Version }).AsEnumerable()
            .Select(k => $"{k.Code} {k.State} v{k.Version}"))));

    /// <summary>The keys of a 422's <c>errors</c>, checked against its <c>problems</c> list, which must say the same.</summary>
    public static HashSet<string> ProblemKeys(JsonObject problem)
    {
        Assert.Equal(422, problem["status"]!.GetValue<int>());
        var keys = problem["errors"]!.AsObject().Select(e => e.Key).ToHashSet();
        var listed = problem["problems"]!.AsArray().Select(p => p!["row"] is { } row
            ? $"{row.GetValue<string>()}/{p["field"]!.GetValue<string>()}"
            : p["field"]!.GetValue<string>()).ToHashSet();
        Assert.Equal(keys, listed);
        return keys;
    }
}

internal sealed record Footprint(int Batches, int Results, int Qc, int Audit, int Attention, string Kits);

/// <summary>A body whose length is not known in advance, so the request has no Content-Length header.</summary>
internal sealed class UnknownLengthContent : HttpContent
{
    private readonly byte[] bytes;

    public UnknownLengthContent(byte[] bytes, string mediaType)
    {
        this.bytes = bytes;
        Headers.ContentType = new(mediaType);
    }

    protected override Task SerializeToStreamAsync(Stream stream, TransportContext? context) => stream.WriteAsync(bytes).AsTask();

    protected override bool TryComputeLength(out long length)
    {
        length = -1;
        return false;
    }
}
