using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

public class JsonBatchTests
{
    [Fact]
    public async Task JsonBatch_MixedUnits_StoredNormalisedWithTheLabsOriginal()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batch = Batch("BCL-2026-0501",
        [
            Result(kit, "first-draw", 0.0124, unit: "mg/L", mdl: 0.0003, reportingLimit: 0.001),
            Result(kit, "flushed", 3.1, unit: "ppb"),
            Result(kit, "first-draw", 310, unit: "ug/L", analyte: "Cu", mdl: 2, reportingLimit: 5),
            Result(kit, "flushed", 0.12, unit: "ppm", analyte: "copper", mdl: 0.002, reportingLimit: 0.005),
        ],
        [
            // QC rows are normalised too: 0.0102 of 0.0100 mg/L is 10.2 of 10.0 µg/L.
            Qc("calibration-blank", measured: 0.04, unit: "ppb"),
            Qc("calibration-check", measured: 0.0102, expected: 0.0100, unit: "mg/L"),
            Qc("calibration-blank", measured: 0.001, analyte: "copper", unit: "mg/L"),
            Qc("calibration-check", measured: 0.49, expected: 0.5, analyte: "copper", unit: "mg/L"),
        ]);

        var outcome = await PostBatchAsync(lab, batch, HttpStatusCode.Created);

        Assert.Equal("BCL-2026-0501", outcome["batchId"]!.GetValue<string>());
        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        Assert.Equal(1, outcome["version"]!.GetValue<int>());
        Assert.True(outcome["qc"]!["passed"]!.GetValue<bool>());
        var leadCheck = Assert.Single(outcome["qc"]!["checks"]!.AsArray(),
            c => c!["type"]?.GetValue<string>() == "calibration-check" && c["analyte"]!.GetValue<string>() == "lead")!;
        Assert.Equal(102.0, leadCheck["value"]!.GetValue<double>(), 6);
        var stored = app.WithDb(db => db.LabQc.Where(q => q.Analyte == Analyte.Lead && q.Type == QcType.CalibrationCheck)
            .Select(q => new { q.Expected, q.Measured, q.Unit }).Single());
        Assert.Equal((10.0, 10.2, "\u00B5g/L"), (Math.Round(stored.Expected!.Value, 9), Math.Round(stored.Measured!.Value, 9), stored.Unit));
        var detail = await GetAsync(lab, "/api/lab/batches/BCL-2026-0501");
        Assert.Equal("accepted", detail["current"]!["status"]!.GetValue<string>());
        var read = detail["results"]!.AsArray().Select(r => r!.AsObject()).ToList();
        Assert.Equal(4, read.Count);
        // (bottle, analyte) → stored value, unit, original value, original unit
        Expect(read, "first-draw", "lead", 12.4, "µg/L", 0.0124, "mg/L");
        Expect(read, "flushed", "lead", 3.1, "µg/L", 3.1, "ppb");
        Expect(read, "first-draw", "copper", 0.31, "mg/L", 310, "ug/L");
        Expect(read, "flushed", "copper", 0.12, "mg/L", 0.12, "ppm");
        Assert.All(read, r => Assert.True(r["current"]!.GetValue<bool>()));
        var leadFirstDraw = read.Single(r => r["bottle"]!.GetValue<string>() == "first-draw" && r["analyte"]!.GetValue<string>() == "lead");
        Assert.Equal(0.3, leadFirstDraw["mdl"]!.GetValue<double>(), 9);
        Assert.Equal(1.0, leadFirstDraw["reportingLimit"]!.GetValue<double>(), 9);

        var results = app.WithDb(db => db.LabResults.Where(r => r.KitCode == kit).ToList());
        Assert.Equal(4, results.Count);
        var copper = results.Single(r => r.Bottle == BottleType.FirstDraw && r.Analyte == Analyte.Copper);
        Assert.Equal(0.31, copper.Value, 9);
        Assert.Equal("mg/L", copper.Unit);
        Assert.Equal((310.0, "ug/L"), (copper.OriginalValue, copper.OriginalUnit));
        Assert.Equal((0.002, 0.005), (Math.Round(copper.Mdl, 9), Math.Round(copper.ReportingLimit, 9)));
        var lead = results.Single(r => r.Bottle == BottleType.FirstDraw && r.Analyte == Analyte.Lead);
        Assert.Equal(12.4, lead.Value, 9);
        Assert.Equal("\u00B5g/L", lead.Unit);
        Assert.Equal((0.0124, "mg/L"), (lead.OriginalValue, lead.OriginalUnit));
        Assert.All(results, r => Assert.Null(r.SupersededAtUtc));
        await AssertAnalyzedAsync(coordinator, kit);
    }

    [Fact]
    public async Task JsonBatch_LeadForFirstDrawOnly_KitStaysReceivedUntilTheFlushedBottleArrives()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);

        // Copper for the flushed bottle does not count: a kit is analysed when every bottle has a lead result.
        await PostBatchAsync(lab, Batch("BCL-PART-1",
        [
            Result(kit, "first-draw", 12.4),
            Result(kit, "flushed", 0.12, unit: "mg/L", analyte: "copper", mdl: 0.002, reportingLimit: 0.005),
        ],
        [.. LeadQc(), Qc("calibration-check", measured: 0.49, expected: 0.5, analyte: "copper", unit: "mg/L")]), HttpStatusCode.Created);
        Assert.Equal("received", await KitStateAsync(coordinator, kit));

        await PostBatchAsync(lab, Batch("BCL-PART-2", [Result(kit, "flushed", 3.1)]), HttpStatusCode.Created);
        var move = await AssertAnalyzedAsync(coordinator, kit);
        Assert.StartsWith("batch BCL-PART-2 v1", move["detail"]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Equal(3, app.WithDb(db => db.LabResults.Count(r => r.KitCode == kit && r.SupersededAtUtc == null)));
    }

    private static void Expect(List<JsonObject> results, string bottle, string analyte, double value, string unit,
        double originalValue, string originalUnit)
    {
        var r = results.Single(r => r["bottle"]!.GetValue<string>() == bottle && r["analyte"]!.GetValue<string>() == analyte);
        Assert.Equal(value, r["value"]!.GetValue<double>(), 9);
        Assert.Equal(unit, r["unit"]!.GetValue<string>());
        Assert.Equal(originalValue, r["originalValue"]!.GetValue<double>(), 9);
        Assert.Equal(originalUnit, r["originalUnit"]!.GetValue<string>());
    }
}
