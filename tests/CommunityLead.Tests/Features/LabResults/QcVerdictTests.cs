using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>The service computes the batch's QC itself; a failing batch is stored as held and changes nothing.</summary>
public class QcVerdictTests
{
    [Fact]
    public async Task Batch_CalibrationCheckAt80Percent_HeldWithEveryFigureAndWindow()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batch = Batch("QC-FAIL-1", BothBottles(kit),
        [
            Qc("calibration-blank", measured: 0.04),
            Qc("calibration-check", measured: 8.0, expected: 10.0),
            Qc("fortified-blank", measured: 17.2, expected: 20.0),
            Qc("matrix-spike", measured: 12.1, unspiked: 4.0, spikeAdded: 10.0),
            Qc("duplicate", measured: 12.0, duplicate: 10.0),
        ]);

        var outcome = await PostBatchAsync(lab, batch, HttpStatusCode.Created);

        Assert.Equal("held", outcome["status"]!.GetValue<string>());
        var qc = outcome["qc"]!;
        Assert.False(qc["passed"]!.GetValue<bool>());
        Assert.Equal(6, qc["checks"]!.AsArray().Count);
        // 8.0 / 10.0 = 80.0% recovery, outside the ±10% window [memory: EPA 200.7/200.8].
        AssertQcCheck(QcCheck(outcome, "calibration-check"), "recovery %", 80.0, 90, 110, passed: false);
        // 17.2 / 20.0 = 86.0%, inside 85–115% [published: EPA 200.8 §9.3.2].
        AssertQcCheck(QcCheck(outcome, "fortified-blank"), "recovery %", 86.0, 85, 115, passed: true);
        // (12.1 − 4.0) / 10.0 = 8.1 / 10.0 = 81.0%, inside 70–130%.
        AssertQcCheck(QcCheck(outcome, "matrix-spike"), "recovery %", 81.0, 70, 130, passed: true);
        // |12.0 − 10.0| / ((12.0 + 10.0) / 2) = 2.0 / 11.0 = 18.18%, at most 20%.
        AssertQcCheck(QcCheck(outcome, "duplicate"), "RPD %", 18.1818, null, 20, passed: true);
        // The blank read 0.04 µg/L, below the batch's reporting limit of 1.0 µg/L.
        AssertQcCheck(QcCheck(outcome, "calibration-blank"), "blank vs reporting limit", 0.04, null, 1.0, passed: true);
        // Two samples need one calibration check; one was run.
        AssertQcCheck(QcCheck(outcome, null), "calibration checks", 1, 1, null, passed: true);
        Assert.Contains("80.0%", QcCheck(outcome, "calibration-check")["detail"]!.GetValue<string>(), StringComparison.Ordinal);

        Assert.Equal("received", await KitStateAsync(coordinator, kit));
        var detail = await GetAsync(lab, "/api/lab/batches/QC-FAIL-1");
        Assert.All(detail["results"]!.AsArray(), r => Assert.False(r!["current"]!.GetValue<bool>()));
        var held = await GetAsync(coordinator, "/api/lab/batches?status=held");
        var listed = Assert.Single(held["items"]!.AsArray())!;
        Assert.Equal(("QC-FAIL-1", false), (listed["batchId"]!.GetValue<string>(), listed["qcPassed"]!.GetValue<bool>()));
        Assert.Empty((await GetAsync(coordinator, "/api/lab/batches?status=accepted"))["items"]!.AsArray());
    }

    [Fact]
    public async Task Batch_ElevenLeadSamplesOneCalibrationCheck_HeldUntilASecondCheckIsAdded()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var positions = Enumerable.Range(1, 11).ToList();
        var profile = new
        {
            samples = positions.Select(p => new
            {
                bottle = "sequential", position = p, volumeMl = 125, collectedAt = $"2026-04-03T06:{p:00}:00+00:00",
                waterLastUsedAt = p == 1 ? "2026-04-02T22:00:00+00:00" : null, tap = "kitchen",
            }),
        };
        var kit = await ReceivedKitAsync(coordinator, lab, kind: "water-sequential", collection: profile);
        JsonObject[] rows = [.. positions.Select(p => WithPosition(Result(kit, "sequential", 2.0 + p), p))];

        var held = await PostBatchAsync(lab, Batch("PROFILE-11", rows), HttpStatusCode.Created);

        Assert.Equal("held", held["status"]!.GetValue<string>());
        // One check per started block of 10 samples: 11 samples need 2 [published: EPA Methods 200.7/200.8].
        AssertQcCheck(QcCheck(held, null), "calibration checks", 1, 2, null, passed: false);
        Assert.Equal("received", await KitStateAsync(coordinator, kit));

        var fixedBatch = Batch("PROFILE-11", rows.Select(r => (JsonObject)r.DeepClone()).ToArray(),
            [.. LeadQc(), Qc("calibration-check", measured: 9.8, expected: 10.0)]);
        fixedBatch["correction"] = true;
        fixedBatch["correctionReason"] = "The closing calibration check was left out of the export.";
        var accepted = await PostBatchAsync(lab, fixedBatch, HttpStatusCode.Created);

        Assert.Equal(("accepted", 2), (accepted["status"]!.GetValue<string>(), accepted["version"]!.GetValue<int>()));
        await AssertAnalyzedAsync(coordinator, kit);
        var detail = await GetAsync(lab, "/api/lab/batches/PROFILE-11");
        Assert.Equal(11, detail["results"]!.AsArray().Count(r => r!["current"]!.GetValue<bool>()));
        Assert.Equal(["held", "accepted"], detail["versions"]!.AsArray().Select(v => v!["status"]!.GetValue<string>()));
    }

    private static JsonObject WithPosition(JsonObject result, int position)
    {
        result["position"] = position;
        return result;
    }
}
