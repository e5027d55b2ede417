using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>A batch carrying the lab's own run: the service fits the curve, judges it, holds on any failure, and draws the report.</summary>
public class RunBatchTests
{
    // 50 counts of blank plus 5,000 counts per µg/L.
    private static JsonArray Reads(double c) => [50 + 5000 * c * 0.99, 50 + 5000 * c, 50 + 5000 * c * 1.01];

    private static JsonObject Calibration() => new()
    {
        ["analyte"] = "lead", ["line"] = "208Pb", ["unit"] = "ug/L",
        ["standards"] = new JsonArray([.. new[] { 0.0, 1, 10, 100 }.Select(c => (JsonNode)new JsonObject { ["nominal"] = c, ["intensities"] = Reads(c) })]),
        ["blankIntensities"] = new JsonArray(45, 50, 55, 48, 52, 50, 50),
    };

    private static JsonObject RunBatch(string batchId, string kit, double firstDraw, double firstDrawReads)
    {
        var first = Result(kit, "first-draw", firstDraw);
        first["intensities"] = Reads(firstDrawReads);
        first["runOrder"] = 3;
        var flushed = Result(kit, "flushed", 3.1);
        flushed["intensities"] = Reads(3.1);
        flushed["runOrder"] = 4;
        var qc = LeadQc();
        qc[0]["runOrder"] = 2;
        qc[1]["runOrder"] = 5;
        var check = Qc("calibration-check", measured: 9.9, expected: 10.0);
        check["runOrder"] = 1;
        var batch = Batch(batchId, [first, flushed], [check, .. qc]);
        batch["run"] = new JsonObject { ["calibrations"] = new JsonArray(Calibration()) };
        return batch;
    }

    private static IEnumerable<JsonObject> Checks(JsonObject outcome, string figure) =>
        outcome["qc"]!["checks"]!.AsArray().Select(c => c!.AsObject()).Where(c => c["figure"]!.GetValue<string>() == figure);

    [Fact]
    public async Task Batch_WithAStraightCurve_AcceptedWithTheServicesOwnFiguresAndAReport()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);

        var outcome = await PostBatchAsync(lab, RunBatch("RUN-OK-1", kit, 12.4, 12.4), HttpStatusCode.Created);

        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        Assert.Equal(5000, Checks(outcome, "calibration slope").Single()["value"]!.GetValue<double>(), 6);
        Assert.True(Checks(outcome, "correlation r").Single()["passed"]!.GetValue<bool>());
        Assert.Equal(2, Checks(outcome, "computed vs reported %").Count());
        Assert.True(Checks(outcome, "check-standard spacing").Single()["passed"]!.GetValue<bool>());
        await AssertAnalyzedAsync(coordinator, kit);

        foreach (var client in new[] { lab, coordinator })
        {
            var report = await client.GetAsync("/api/lab/batches/RUN-OK-1/qc-report");
            await Expect(report, HttpStatusCode.OK);
            Assert.Equal("application/pdf", report.Content.Headers.ContentType!.MediaType);
            var pdf = await report.Content.ReadAsByteArrayAsync();
            Assert.Equal("%PDF-"u8.ToArray(), pdf[..5]);
            // One page for lead's charts and at least one for the table of figures.
            var pages = System.Text.RegularExpressions.Regex.Count(System.Text.Encoding.Latin1.GetString(pdf), @"/Type\s*/Page(?!s)");
            Assert.True(pages >= 2, $"{pages} pages");
            if (Environment.GetEnvironmentVariable("QC_REPORT_OUT") is { Length: > 0 } folder)
                await File.WriteAllBytesAsync(Path.Combine(folder, "run-ok.pdf"), pdf);
        }
    }

    [Fact]
    public async Task Batch_WithASampleAboveTheHighestStandard_HeldAndKeptOutOfInterpretation()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);

        var outcome = await PostBatchAsync(lab, RunBatch("RUN-OVER-1", kit, 240, 240), HttpStatusCode.Created);

        Assert.Equal("held", outcome["status"]!.GetValue<string>());
        var range = Checks(outcome, "calibrated range").Single();
        Assert.False(range["passed"]!.GetValue<bool>());
        Assert.Contains($"{kit} first-draw", range["detail"]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Contains("dilute and analyse again", range["detail"]!.GetValue<string>(), StringComparison.Ordinal);
        // Held like any QC failure: the kit has no results in effect and no interpretation, so no letter.
        Assert.Equal("received", await KitStateAsync(coordinator, kit));
    }

    [Fact]
    public async Task Batch_WhoseReportedValueTheIntensitiesDoNotGive_HeldNamingTheSample()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);

        var outcome = await PostBatchAsync(lab, RunBatch("RUN-DIFF-1", kit, 12.4, 8.0), HttpStatusCode.Created);

        Assert.Equal("held", outcome["status"]!.GetValue<string>());
        var failed = Checks(outcome, "computed vs reported %").Single(c => !c["passed"]!.GetValue<bool>());
        Assert.StartsWith($"{kit} first-draw", failed["detail"]!.GetValue<string>(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Batch_WithTooFewStandardsAndABadWeighting_RefusedNamingEachField()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batch = RunBatch("RUN-BAD-1", kit, 12.4, 12.4);
        var calibration = batch["run"]!["calibrations"]![0]!.AsObject();
        calibration["weighting"] = "1/y";
        calibration["standards"]!.AsArray().RemoveAt(3);
        calibration["standards"]!.AsArray().RemoveAt(2);

        var problem = await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity);

        var errors = problem["errors"]!.AsObject();
        Assert.True(errors.ContainsKey("/run/calibrations/0/weighting"), errors.ToJsonString());
        Assert.True(errors.ContainsKey("/run/calibrations/0/standards"), errors.ToJsonString());
        Assert.Empty((await GetAsync(coordinator, "/api/lab/batches"))["items"]!.AsArray());
    }

    [Fact]
    public async Task CsvBatch_WithCalibrationRows_GivesTheSameVerdictAsJson()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        static string R(double c) => string.Join('|', Reads(c).Select(n => n!.GetValue<double>().ToString(System.Globalization.CultureInfo.InvariantCulture)));
        var csv = string.Join('\n',
            "sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit,expected,measured,intensities,runOrder,line",
            $"calibration-standard,,,lead,,ug/L,,,0,,{R(0)},,208Pb",
            $"calibration-standard,,,lead,,ug/L,,,1,,{R(1)},,208Pb",
            $"calibration-standard,,,lead,,ug/L,,,10,,{R(10)},,208Pb",
            $"calibration-standard,,,lead,,ug/L,,,100,,{R(100)},,208Pb",
            "blank-reading,,,lead,,,,,,,45|50|55|48|52|50|50,,208Pb",
            "calibration-check,,,lead,,ug/L,,,10,9.9,,1,",
            "calibration-blank,,,lead,,ug/L,,,,0.04,,2,",
            $"sample,{kit},first-draw,lead,12.4,ug/L,0.3,1.0,,,{R(12.4)},3,",
            $"sample,{kit},flushed,lead,3.1,ug/L,0.3,1.0,,,{R(3.1)},4,",
            "calibration-check,,,lead,,ug/L,,,10,10.2,,5,") + "\n";

        var csvOutcome = await ReadAsync(await PostCsvAsync(lab, Query("RUN-CSV-1"), csv), HttpStatusCode.Created);

        Assert.Equal("accepted", csvOutcome["status"]!.GetValue<string>());
        Assert.Equal(5000, Checks(csvOutcome, "calibration slope").Single()["value"]!.GetValue<double>(), 6);
        Assert.Equal(2, Checks(csvOutcome, "computed vs reported %").Count(c => c["passed"]!.GetValue<bool>()));
        Assert.True(Checks(csvOutcome, "check-standard spacing").Single()["passed"]!.GetValue<bool>());
        Assert.True(Checks(csvOutcome, "detection limit from blanks").Single()["passed"]!.GetValue<bool>());
    }
}
