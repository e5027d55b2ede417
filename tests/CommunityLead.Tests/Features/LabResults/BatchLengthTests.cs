using System.Net;
using System.Text.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Data;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// Batch texts against their columns. BatchChecker refuses what a column cannot hold, with every other problem, in
/// one 422 before anything is written; without it PostgreSQL's refusal came back as a 500 or a false "raced" 409.
/// </summary>
public class BatchLengthTests
{
    /// <summary>(header field, column, one character too long)</summary>
    public static readonly TheoryData<string, string> Headers = new()
    {
        { "batchId", "LabBatch.BatchId" }, { "method", "LabBatch.Method" }, { "correctionReason", "LabBatch.CorrectionReason" },
    };

    [Theory]
    [MemberData(nameof(Headers))]
    public async Task JsonBatch_HeaderOneCharacterOverItsColumn_422SayingTheLimitAndNothingWritten(string field, string column)
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var limit = StoreModel.MaxLength(column);
        var batch = Batch("LONG-1", BothBottles(kit));
        batch[field] = new string('B', limit + 1);
        batch["correction"] = field == "correctionReason";
        var before = FootprintOf(app);

        var refused = await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity);

        Assert.Equal([field], ProblemKeys(refused));
        Assert.Contains($"{limit}", refused["errors"]![field]![0]!.GetValue<string>());
        Assert.Equal(before, FootprintOf(app));
    }

    [Theory]
    [MemberData(nameof(Headers))]
    public async Task CsvBatch_QueryFieldOneCharacterOverItsColumn_422SayingTheLimitAndNothingWritten(string field, string column)
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var limit = StoreModel.MaxLength(column);
        var text = new string('B', limit + 1);
        var query = field switch
        {
            "batchId" => Query(text),
            "method" => Query("LONG-1", method: text),
            _ => $"{Query("LONG-1")}&correction=true&correctionReason={text}",
        };
        var before = FootprintOf(app);

        var response = await PostCsvAsync(lab, query, $"kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n{kit},first-draw,lead,12.4,ug/L,0.3,1.0\n");

        var refused = await ReadAsync(response, HttpStatusCode.UnprocessableEntity);
        Assert.Equal([field], ProblemKeys(refused));
        Assert.Contains($"{limit}", refused["errors"]![field]![0]!.GetValue<string>());
        Assert.Equal(before, FootprintOf(app));
    }

    /// <summary>(field, JSON value, words the reason must hold): units and qualifiers are closed lists, replicates at most 20.</summary>
    public static readonly TheoryData<string, string, string> RowTexts = new()
    {
        { "unit", "\"micrograms per litre\"", "ug/L" },
        { "qualifier", "\"<RL\"", "'<'" },
        { "replicates", $"[{string.Join(",", Enumerable.Repeat("12.4", 21))}]", "20" },
    };

    /// <summary>The same as CSV cells.</summary>
    public static readonly TheoryData<string, string, string> RowCells = new()
    {
        { "unit", "micrograms per litre", "ug/L" },
        { "qualifier", "<RL", "'<'" },
        { "replicates", string.Join("|", Enumerable.Repeat("12.4", 21)), "20" },
    };

    [Theory]
    [MemberData(nameof(RowTexts))]
    public async Task JsonBatch_RowTextNotInWhatTheColumnHolds_422NamingItAndNothingWritten(string field, string json, string reason)
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batch = Batch("LONG-1", BothBottles(kit));
        batch["results"]![1]![field] = JsonNode.Parse(json);
        var before = FootprintOf(app);

        var refused = await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity);

        Assert.Equal([$"/results/1/{field}"], ProblemKeys(refused));
        Assert.Contains(reason, refused["errors"]![$"/results/1/{field}"]![0]!.GetValue<string>());
        Assert.Equal(before, FootprintOf(app));
    }

    [Theory]
    [MemberData(nameof(RowCells))]
    public async Task CsvBatch_RowTextNotInWhatTheColumnHolds_422NamingTheLineAndNothingWritten(string field, string cell, string reason)
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var cells = new Dictionary<string, string> { ["unit"] = "ug/L", ["qualifier"] = "", ["replicates"] = "", [field] = cell };
        var csv = "kitCode,bottle,analyte,value,mdl,reportingLimit,unit,qualifier,replicates\n" +
            $"{kit},first-draw,lead,12.4,0.3,1.0,ug/L,,\n{kit},flushed,lead,12.4,0.3,1.0,{cells["unit"]},{cells["qualifier"]},{cells["replicates"]}\n";
        var before = FootprintOf(app);

        var refused = await ReadAsync(await PostCsvAsync(lab, Query("LONG-1"), csv), HttpStatusCode.UnprocessableEntity);

        Assert.Equal([$"row 3/{field}"], ProblemKeys(refused));
        Assert.Contains(reason, refused["errors"]![$"row 3/{field}"]![0]!.GetValue<string>());
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task JsonBatch_TextsAtTheirColumnLength_AreStoredWhole()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batchId = new string('B', StoreModel.MaxLength("LabBatch.BatchId"));
        var method = new string('M', StoreModel.MaxLength("LabBatch.Method"));
        var rows = BothBottles(kit);
        rows[0]["replicates"] = new JsonArray([.. Enumerable.Range(0, 20).Select(_ => (JsonNode?)JsonValue.Create(double.MaxValue / 1001))]);
        (rows[0]["unit"], rows[0]["qualifier"], rows[0]["value"]) = ("mg/L", "J", 0.0124);
        (rows[0]["mdl"], rows[0]["reportingLimit"]) = (0.0003, 0.001);
        await PostBatchAsync(lab, Batch(batchId, rows, method: method), HttpStatusCode.Created);
        var correction = Batch(batchId, BothBottles(kit, firstDraw: 12.5), method: method);
        (correction["correction"], correction["correctionReason"]) = (true, new string('C', StoreModel.MaxLength("LabBatch.CorrectionReason")));

        await PostBatchAsync(lab, correction, HttpStatusCode.Created);

        var stored = app.WithDb(db => db.LabBatches.OrderBy(b => b.Version).Select(b => new { b.BatchId, b.Method, b.CorrectionReason }).ToList());
        Assert.Equal([batchId, batchId], stored.Select(b => b.BatchId));
        Assert.Equal(method, stored[1].Method);
        Assert.Equal(correction["correctionReason"]!.GetValue<string>(), stored[1].CorrectionReason);
        Assert.Equal(20, JsonSerializer.Deserialize<double[]>(app.WithDb(db => db.LabResults.First(r => r.ReplicatesJson != null).ReplicatesJson)!)!.Length);
    }

    [Fact]
    public async Task Release_ReasonOneCharacterOverItsColumn_400AndTheBatchStaysHeld()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        await PostBatchAsync(lab, Batch("HELD-1", BothBottles(kit), [Qc("calibration-check", measured: 8.0, expected: 10.0)]), HttpStatusCode.Created);
        var limit = StoreModel.MaxLength("LabBatch.ReleaseReason");
        var before = FootprintOf(app);

        var problem = await PostAsync(coordinator, "/api/lab/batches/HELD-1/release", new { reason = new string('R', limit + 1) }, HttpStatusCode.BadRequest);

        Assert.Contains($"{limit}", problem["errors"]!["reason"]![0]!.GetValue<string>());
        Assert.Equal(before, FootprintOf(app));
        Assert.Equal("held", (await GetAsync(coordinator, "/api/lab/batches/HELD-1"))["current"]!["status"]!.GetValue<string>());
        await PostAsync(coordinator, "/api/lab/batches/HELD-1/release", new { reason = new string('R', limit) }, HttpStatusCode.OK);
    }

    [Fact]
    public void Batch_WorstCaseReplicatesAndHoldingFlags_FitTheirColumns()
    {
        // Twenty replicates of the longest a double prints, and both holding flags with the largest day counts and
        // limits a DateTimeOffset can reach, stored the way intake stores them.
        var collected = DateTimeOffset.MinValue;
        var late = DateTimeOffset.MaxValue;
        var limits = new HoldingLimits { AnalysisWithinMonths = 119_000, AcidificationWithin = TimeSpan.FromDays(3_600_000).Add(TimeSpan.FromHours(23)) };
        var holding = HoldingTimes.Check(collected, late, late, limits);
        Assert.Equal(2, holding.Count);
        var row = new ResultRow("K", "first-draw", null, null, "lead", 1, "ug/L", null, 0.3, 1, null, null, null);
        var result = new CheckedResult(row, 1, "K", BottleType.FirstDraw, null, Matrix.Water, Analyte.Lead, 1, "µg/L", 0.3, 1, null,
            [.. Enumerable.Repeat(double.MaxValue, 19), 2.2250738585072014E-308], late, collected, holding);
        var json = new JsonSerializerOptions(JsonSerializerDefaults.Web);
        JsonSetup.Configure(json);

        var stored = BatchRecords.Result(result, 1, json);

        Assert.InRange(stored.ReplicatesJson!.Length, 1, StoreModel.MaxLength("LabResult.ReplicatesJson"));
        Assert.InRange(stored.HoldingFlags!.Length, 1, StoreModel.MaxLength("LabResult.HoldingFlags"));
    }
}
