using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>A held batch comes into effect when a coordinator releases it with a reason, or when a passing correction arrives.</summary>
public class ReleaseTests
{
    private const string Path = "/api/lab/batches/HELD-1/release";

    [Fact]
    public async Task HeldBatch_ReleasedByCoordinatorWithReason_ResultsInEffectAndKitAnalyzed()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab, kit) = await HeldBatchAsync(app);
        app.Clock.Now = app.Clock.Now.AddHours(3);

        var released = await PostAsync(coordinator, Path,
            new { reason = "Lab re-ran the calibration check at 9.9 µg/L; the samples were bracketed by passing checks." }, HttpStatusCode.OK);

        Assert.Equal("released", released["status"]!.GetValue<string>());
        Assert.StartsWith("coordinator-", released["release"]!["by"]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.StartsWith("Lab re-ran", released["release"]!["reason"]!.GetValue<string>(), StringComparison.Ordinal);
        // The verdict stays on record as computed: release does not turn a failed check into a pass.
        Assert.False(released["qc"]!["passed"]!.GetValue<bool>());
        await AssertAnalyzedAsync(coordinator, kit);
        var detail = await GetAsync(lab, "/api/lab/batches/HELD-1");
        Assert.All(detail["results"]!.AsArray(), r => Assert.True(r!["current"]!.GetValue<bool>()));
        Assert.Empty((await GetAsync(coordinator, "/api/lab/batches?status=held"))["items"]!.AsArray());
        var audit = app.WithDb(db => db.AuditTrail.Count(a => a.Action == "release"));
        Assert.Equal(1, audit);
    }

    [Fact]
    public async Task HeldBatch_ReleaseWithoutReason_400AndStillHeld()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, _, kit) = await HeldBatchAsync(app);

        var problem = await PostAsync(coordinator, Path, new { reason = "" }, HttpStatusCode.BadRequest);

        Assert.NotNull(problem["errors"]!["reason"]);
        Assert.Equal("held", (await GetAsync(coordinator, "/api/lab/batches/HELD-1"))["current"]!["status"]!.GetValue<string>());
        Assert.Equal("received", await KitStateAsync(coordinator, kit));
    }

    [Fact]
    public async Task HeldBatch_LabKey_403()
    {
        using var app = new CommunityLeadFactory();
        var (_, lab, _) = await HeldBatchAsync(app);

        var response = await lab.PostAsJsonAsync(Path, new { reason = "We are confident in these numbers." });

        await Expect(response, HttpStatusCode.Forbidden);
    }

    [Fact]
    public async Task AcceptedBatch_Release_409()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        await PostBatchAsync(lab, Batch("GOOD-1", BothBottles(kit)), HttpStatusCode.Created);

        var conflict = await PostAsync(coordinator, "/api/lab/batches/GOOD-1/release", new { reason = "Just in case." },
            HttpStatusCode.Conflict);

        Assert.Equal(409, conflict["status"]!.GetValue<int>());
        Assert.Equal("accepted", conflict["batchStatus"]!.GetValue<string>());
        await PostAsync(coordinator, "/api/lab/batches/NO-SUCH/release", new { reason = "Just in case." }, HttpStatusCode.NotFound);
    }

    [Fact]
    public async Task HeldBatch_PassingCorrection_AcceptedAndInEffect()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab, kit) = await HeldBatchAsync(app);
        var correction = Batch("HELD-1", BothBottles(kit));
        correction["correction"] = true;
        correction["correctionReason"] = "Calibration check re-run after recalibration.";

        var outcome = await PostBatchAsync(lab, correction, HttpStatusCode.Created);

        Assert.Equal(("accepted", 2), (outcome["status"]!.GetValue<string>(), outcome["version"]!.GetValue<int>()));
        await AssertAnalyzedAsync(coordinator, kit);
        var detail = await GetAsync(lab, "/api/lab/batches/HELD-1");
        Assert.All(detail["results"]!.AsArray(), r => Assert.True(r!["current"]!.GetValue<bool>()));
        // Only the latest version can be released, and it is not held.
        await PostAsync(coordinator, Path, new { reason = "Release the old version." }, HttpStatusCode.Conflict);
    }

    /// <summary>A received kit with both bottles in batch HELD-1, whose only calibration check recovered 80%.</summary>
    [Fact]
    public async Task HeldBatch_OneKitReplacedMeanwhile_ReleaseStillGoesThroughAndFlagsThatKit()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var (replaced, other) = (await ReceivedKitAsync(coordinator, lab), await ReceivedKitAsync(coordinator, lab));
        await PostBatchAsync(lab, Batch("HELD-1", [.. BothBottles(replaced), .. BothBottles(other)],
            [Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 8.0, expected: 10.0)]), HttpStatusCode.Created);
        // While the batch waits, the coordinator sends one household a new kit: the old one is cancelled.
        await PostAsync(coordinator, $"/api/kits/{replaced}/replacement", new { reason = "Results held; sending a fresh kit." }, HttpStatusCode.Created);

        var released = await PostAsync(coordinator, Path, new { reason = "Lab showed the check was mis-keyed; the run was in control." },
            HttpStatusCode.OK);

        await AssertAnalyzedAsync(coordinator, other);
        Assert.Equal("cancelled", await KitStateAsync(coordinator, replaced));
        var flagged = released["flags"]!.AsArray().Where(f => f!["code"]!.GetValue<string>() == "kit-not-open").ToList();
        Assert.Equal(2, flagged.Count);
        Assert.All(flagged, f => Assert.Equal(replaced, f!["kitCode"]!.GetValue<string>()));
    }

    private static async Task<(HttpClient Coordinator, HttpClient Lab, string Kit)> HeldBatchAsync(CommunityLeadFactory app)
    {
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var held = await PostBatchAsync(lab, Batch("HELD-1", BothBottles(kit),
            [Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 8.0, expected: 10.0)]), HttpStatusCode.Created);
        Assert.Equal("held", held["status"]!.GetValue<string>());
        return (coordinator, lab, kit);
    }
}

public class LateReleaseTests
{
    [Fact]
    public async Task Release_OlderHeldBatchAfterANewerOne_NewerResultsStayCurrent()
    {
        using var app = new CommunityLead.Tests.Infrastructure.CommunityLeadFactory();
        var flow = new CommunityLead.Tests.Features.Interpretation.ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        var held = await flow.PostLeadAsync(code, firstDraw: 30, flushed: 20, calibration: 7.5);   // 75 %: held
        app.Clock.Now = app.Clock.Now.AddHours(2);
        await flow.PostLeadAsync(code, firstDraw: 4, flushed: 1.5);                                  // re-run, accepted
        app.Clock.Now = app.Clock.Now.AddHours(2);
        await CommunityLead.Tests.Infrastructure.Fixtures.PostAsync(flow.Coordinator,
            $"/api/lab/batches/{held["batchId"]}/release", new { reason = "lab says the check was mislabelled" }, System.Net.HttpStatusCode.OK);

        var current = app.WithDb(db => db.LabResults.Where(r => r.KitCode == code && r.SupersededAtUtc == null)
            .Select(r => r.Value).OrderBy(v => v).ToList());
        Assert.Equal([1.5, 4.0], current);
    }
}
