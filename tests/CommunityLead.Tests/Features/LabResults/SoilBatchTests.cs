using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

public class SoilBatchTests
{
    [Fact]
    public async Task SoilXrfBatch_WithUncertainty_StoredInMgPerKgAndPpmAccepted()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab, kind: "soil");
        var batch = Batch("XRF-2026-04",
        [
            Soil(Result(kit, "soil", 520, unit: "mg/kg", mdl: 12, reportingLimit: 20), "play-area", uncertainty: 35),
            Soil(Result(kit, "soil", 180, unit: "ppm", mdl: 12, reportingLimit: 20), "garden", uncertainty: 20),
        ],
        [
            Qc("calibration-blank", measured: 4, unit: "mg/kg"),
            Qc("calibration-check", measured: 489, expected: 500, unit: "mg/kg"),
        ], method: "EPA 6200");

        var outcome = await PostBatchAsync(lab, batch, HttpStatusCode.Created);

        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        Assert.Equal("EPA 6200", outcome["method"]!.GetValue<string>());
        // 489 / 500 = 97.8% recovery.
        AssertQcCheck(QcCheck(outcome, "calibration-check"), "recovery %", 97.8, 90, 110, passed: true);
        var stored = app.WithDb(db => db.LabResults.OrderBy(r => r.Id).ToList());
        Assert.Equal(
            [(SoilLocation.PlayArea, 520.0, "mg/kg", 35.0, "mg/kg"), (SoilLocation.Garden, 180.0, "mg/kg", 20.0, "ppm")],
            stored.Select(r => (r.Location!.Value, r.Value, r.Unit, r.Uncertainty!.Value, r.OriginalUnit)));
        Assert.All(stored, r => Assert.Equal(BottleType.Soil, r.Bottle));
        var read = (await GetAsync(lab, "/api/lab/batches/XRF-2026-04"))["results"]!.AsArray();
        Assert.Equal([("play-area", 35.0), ("garden", 20.0)],
            read.Select(r => (r!["location"]!.GetValue<string>(), r["uncertainty"]!.GetValue<double>())));
        await AssertAnalyzedAsync(coordinator, kit);
    }

    [Fact]
    public async Task SoilBatch_PpbOrLocationNotSampled_422()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab, kind: "soil");
        var before = FootprintOf(app);
        var batch = Batch("XRF-BAD",
        [
            Soil(Result(kit, "soil", 520, unit: "ppb", mdl: 12, reportingLimit: 20), "play-area", uncertainty: 35),
            Soil(Result(kit, "soil", 180, unit: "mg/kg", mdl: 12, reportingLimit: 20), "drip-line", uncertainty: 20),
            Soil(Result(kit, "soil", 180, unit: "mg/kg", mdl: 12, reportingLimit: 20), "garden", uncertainty: -1),
        ],
        [Qc("calibration-check", measured: 489, expected: 500, unit: "mg/kg")], method: "EPA 6200");

        var refused = await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity);

        // ppb would be µg/kg, in which no soil level is written; the drip line was not sampled.
        Assert.Equal(new HashSet<string> { "/results/0/unit", "/results/1/bottle", "/results/2/uncertainty" }, ProblemKeys(refused));
        Assert.Equal(before, FootprintOf(app));
    }

    private static JsonObject Soil(JsonObject result, string location, double uncertainty)
    {
        result["location"] = location;
        result["uncertainty"] = uncertainty;
        return result;
    }
}
