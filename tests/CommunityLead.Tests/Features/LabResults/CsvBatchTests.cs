using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

public class CsvBatchTests
{
    [Fact]
    public async Task CsvBatch_SemicolonsBomShuffledMixedCaseHeaders_Accepted()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var csv = $"""
            Unit;ANALYTE;measured;kitcode;Value;BOTTLE;SampleType;mdl;ReportingLimit;EXPECTED
            mg/L;Pb;;{kit};0.0124;first-draw;sample;0.0003;0.001;
            ppb;lead;;{kit};3.1;flushed;;0.3;1.0;
            ug/L;lead;0.04;;;;calibration-blank;;;
            ug/L;lead;10.2;;;;Calibration-Check;;;10.0

            """;

        var outcome = await ReadAsync(await PostCsvAsync(lab, Query("CSV-SEMI-1"), csv, bom: true), HttpStatusCode.Created);

        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        Assert.Equal("CSV-SEMI-1", outcome["batchId"]!.GetValue<string>());
        Assert.Equal("EPA 200.8", outcome["method"]!.GetValue<string>());
        Assert.Equal(2, outcome["resultCount"]!.GetValue<int>());
        // Both QC rows were read as QC: a blank, a recovery and the frequency check.
        var figures = outcome["qc"]!["checks"]!.AsArray().Select(c => c!["figure"]!.GetValue<string>()).Order().ToList();
        Assert.Equal(["blank vs reporting limit", "calibration checks", "recovery %"], figures);
        var stored = app.WithDb(db => db.LabResults.OrderBy(r => r.Id).ToList());
        Assert.Equal([12.4, 3.1], stored.Select(r => Math.Round(r.Value, 9)));
        Assert.Equal(["mg/L", "ppb"], stored.Select(r => r.OriginalUnit));
        Assert.Equal("csv", app.WithDb(db => db.LabBatches.Single().Format));
        await AssertAnalyzedAsync(coordinator, kit);
    }

    [Fact]
    public async Task CsvBatch_CommaSeparatedWithoutBom_Accepted()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var csv = $"""
            kitCode,bottle,analyte,value,unit,qualifier,mdl,reportingLimit,sampleType,expected,measured
            {kit},first-draw,lead,1.0,ug/L,<,0.3,1.0,sample,,
            {kit},flushed,lead,2.5,ug/L,J,0.3,1.0,sample,,
            ,,lead,,ug/L,,,,calibration-check,10.0,9.7
            """;

        var outcome = await ReadAsync(await PostCsvAsync(lab, Query("CSV-COMMA-1"), csv), HttpStatusCode.Created);

        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        var stored = app.WithDb(db => db.LabResults.OrderBy(r => r.Id).Select(r => new { r.Bottle, r.Value, r.Qualifier }).ToList());
        Assert.Equal([(BottleType.FirstDraw, 1.0, "<"), (BottleType.Flushed, 2.5, "J")],
            stored.Select(r => (r.Bottle, r.Value, r.Qualifier)));
    }

    [Fact]
    public async Task CsvBatch_CorrectionInTheQueryString_Version2()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        string Csv(double firstDraw) => $"""
            kitCode,bottle,analyte,value,unit,mdl,reportingLimit,sampleType,expected,measured
            {kit},first-draw,lead,{firstDraw:0.0},ug/L,0.3,1.0,,,
            {kit},flushed,lead,3.1,ug/L,0.3,1.0,,,
            ,,lead,,ug/L,,,calibration-check,10.0,9.7
            """;
        await ReadAsync(await PostCsvAsync(lab, Query("CSV-CORR"), Csv(12.4)), HttpStatusCode.Created);
        await ReadAsync(await PostCsvAsync(lab, Query("CSV-CORR"), Csv(21.4)), HttpStatusCode.Conflict);

        var outcome = await ReadAsync(await PostCsvAsync(lab,
            Query("CSV-CORR") + "&correction=true&correctionReason=" + Uri.EscapeDataString("Digits swapped on entry."), Csv(21.4)),
            HttpStatusCode.Created);

        Assert.Equal((2, "Digits swapped on entry."), (outcome["version"]!.GetValue<int>(), outcome["correctionReason"]!.GetValue<string>()));
        var current = app.WithDb(db => db.LabResults
            .Where(r => r.SupersededAtUtc == null && r.Bottle == BottleType.FirstDraw).Select(r => r.Value).ToList());
        Assert.Equal([21.4], current);
    }

    [Fact]
    public async Task CsvBatch_SameContentAsJson_StoresTheSameValues()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var viaJson = await ReceivedKitAsync(coordinator, lab);
        var viaCsv = await ReceivedKitAsync(coordinator, lab);
        var json = Batch("SAME-JSON",
        [
            WithExtras(Result(viaJson, "first-draw", 0.0124, unit: "mg/L", mdl: 0.0003, reportingLimit: 0.001)),
            Qualified(Result(viaJson, "flushed", 1.0), "<"),
            Result(viaJson, "first-draw", 310, unit: "ug/L", analyte: "copper", mdl: 2, reportingLimit: 5),
        ],
        [.. LeadQc(), Qc("calibration-check", measured: 0.49, expected: 0.5, analyte: "copper", unit: "mg/L")]);
        var csv = $"""
            sampleType;kitCode;bottle;analyte;value;unit;qualifier;mdl;reportingLimit;replicates;acidifiedAt;expected;measured
            sample;{viaCsv};first-draw;lead;0.0124;mg/L;;0.0003;0.001;0.0121|0.0126|0.0125;2026-04-03T09:00:00-05:00;;
            sample;{viaCsv};flushed;lead;1.0;ug/L;<;0.3;1.0;;;;
            sample;{viaCsv};first-draw;copper;310;ug/L;;2;5;;;;
            calibration-blank;;;lead;;ug/L;;;;;;;0.04
            calibration-check;;;lead;;ug/L;;;;;;10.0;10.2
            calibration-check;;;copper;;mg/L;;;;;;0.5;0.49
            """;

        await PostBatchAsync(lab, json, HttpStatusCode.Created);
        await ReadAsync(await PostCsvAsync(lab, Query("SAME-CSV"), csv), HttpStatusCode.Created);

        var stored = app.WithDb(db => db.LabResults.OrderBy(r => r.Id).ToList());
        string Describe(string kit) => string.Join("\n", stored.Where(r => r.KitCode == kit).Select(r =>
            $"{r.Bottle} {r.Analyte} {r.Value:R} {r.Unit} {r.OriginalValue:R} {r.OriginalUnit} {r.Qualifier} {r.Mdl:R} " +
            $"{r.ReportingLimit:R} {r.ReplicatesJson} {r.AcidifiedAt:O} {r.CollectedAt:O} {r.HoldingFlags}"));
        Assert.Equal(3, stored.Count(r => r.KitCode == viaCsv));
        Assert.Equal(Describe(viaJson), Describe(viaCsv));
        var replicates = stored.Single(r => r.KitCode == viaCsv && r.Bottle == BottleType.FirstDraw && r.Analyte == Analyte.Lead).ReplicatesJson;
        Assert.Equal([12.1, 12.6, 12.5], System.Text.Json.JsonSerializer.Deserialize<double[]>(replicates!)!.Select(v => Math.Round(v, 9)));
        var verdicts = app.WithDb(db => db.LabBatches.OrderBy(b => b.Id).Select(b => b.QcJson).ToList());
        Assert.Equal(verdicts[0], verdicts[1]);
    }

    private static JsonObject WithExtras(JsonObject result)
    {
        result["replicates"] = new JsonArray(0.0121, 0.0126, 0.0125);
        result["acidifiedAt"] = "2026-04-03T09:00:00-05:00";
        return result;
    }

    private static JsonObject Qualified(JsonObject result, string qualifier)
    {
        result["qualifier"] = qualifier;
        return result;
    }
}
