using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>A batch id names one batch: posted again it is recognised, changed it needs a correction, and nothing is overwritten.</summary>
public class IdempotencyTests
{
    [Fact]
    public async Task Batch_PostedTwice_201Then200WithTheSameOutcomeAndNoNewRows()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var empty = FootprintOf(app);

        var first = await PostBatchAsync(lab, Batch("TWICE-1", BothBottles(kit)), HttpStatusCode.Created);
        var afterFirst = FootprintOf(app);
        app.Clock.Now = app.Clock.Now.AddHours(2);
        var second = await PostBatchAsync(lab, Batch("TWICE-1", BothBottles(kit)), HttpStatusCode.OK);

        Assert.NotEqual(empty, afterFirst);
        Assert.Equal(afterFirst, FootprintOf(app));
        Assert.Equal(first.ToJsonString(), second.ToJsonString());
        Assert.Equal(1, second["version"]!.GetValue<int>());
    }

    [Fact]
    public async Task Batch_PostedAgainAfterItsKitWasClosed_200WithTheOriginalOutcome()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var first = await PostBatchAsync(lab, Batch("RETRY-1", BothBottles(kit)), HttpStatusCode.Created);
        // A lab's retry can come after the kit has moved on; the batch is still the one already stored.
        app.WithDb(db =>
        {
            db.Kits.Single(k => k.Code == kit).State = KitState.Closed;
            return db.SaveChanges();
        });
        var before = FootprintOf(app);

        var again = await PostBatchAsync(lab, Batch("RETRY-1", BothBottles(kit)), HttpStatusCode.OK);

        Assert.Equal(first.ToJsonString(), again.ToJsonString());
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task Batch_SameIdChangedValue_409AndNothingWritten()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        await PostBatchAsync(lab, Batch("CHANGED-1", BothBottles(kit, firstDraw: 12.4)), HttpStatusCode.Created);
        var before = FootprintOf(app);

        var conflict = await PostBatchAsync(lab, Batch("CHANGED-1", BothBottles(kit, firstDraw: 14.2)), HttpStatusCode.Conflict);

        Assert.Equal(1, conflict["currentVersion"]!.GetValue<int>());
        Assert.Contains("correction", conflict["detail"]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Equal(before, FootprintOf(app));
        Assert.Equal(12.4, app.WithDb(db => db.LabResults.Single(r => r.Bottle == BottleType.FirstDraw).Value), 9);
    }

    [Fact]
    public async Task Batch_Correction_Version2CurrentAndVersion1KeptButSuperseded()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        await PostBatchAsync(lab, Batch("CORR-1", BothBottles(kit, firstDraw: 12.4)), HttpStatusCode.Created);
        app.Clock.Now = app.Clock.Now.AddHours(1);
        var correction = Batch("CORR-1", BothBottles(kit, firstDraw: 14.2));
        correction["correction"] = true;
        correction["correctionReason"] = "First-draw result was transcribed from the wrong sample position.";

        var outcome = await PostBatchAsync(lab, correction, HttpStatusCode.Created);

        Assert.Equal(2, outcome["version"]!.GetValue<int>());
        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        Assert.Equal("First-draw result was transcribed from the wrong sample position.", outcome["correctionReason"]!.GetValue<string>());
        var detail = await GetAsync(lab, "/api/lab/batches/CORR-1");
        Assert.Equal([1, 2], detail["versions"]!.AsArray().Select(v => v!["version"]!.GetValue<int>()));
        Assert.Equal(2, detail["current"]!["version"]!.GetValue<int>());
        var current = detail["results"]!.AsArray();
        Assert.All(current, r => Assert.True(r!["current"]!.GetValue<bool>()));
        Assert.Equal(14.2, current.Single(r => r!["bottle"]!.GetValue<string>() == "first-draw")!["value"]!.GetValue<double>(), 9);

        var firstDraws = app.WithDb(db => db.LabResults.Where(r => r.Bottle == BottleType.FirstDraw)
            .OrderBy(r => r.Id).Select(r => new { r.Value, r.SupersededAtUtc, r.Batch!.Version }).ToList());
        Assert.Equal(2, firstDraws.Count);
        Assert.Equal((1, 12.4), (firstDraws[0].Version, firstDraws[0].Value));
        Assert.Equal(app.Clock.Now.UtcDateTime, firstDraws[0].SupersededAtUtc);
        Assert.Equal((2, 14.2), (firstDraws[1].Version, firstDraws[1].Value));
        Assert.Null(firstDraws[1].SupersededAtUtc);
        Assert.Equal(2, app.WithDb(db => db.LabResults.Count(r => r.SupersededAtUtc == null)));
        await AssertAnalyzedAsync(coordinator, kit);

        // The same correction again is recognised like any repeated post.
        var again = await PostBatchAsync(lab, correction, HttpStatusCode.OK);
        Assert.Equal(2, again["version"]!.GetValue<int>());
        Assert.Equal(4, app.WithDb(db => db.LabResults.Count()));
    }

    [Fact]
    public async Task Batch_CorrectionWithoutReason_422AndNothingWritten()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        await PostBatchAsync(lab, Batch("CORR-2", BothBottles(kit)), HttpStatusCode.Created);
        var before = FootprintOf(app);
        var correction = Batch("CORR-2", BothBottles(kit, firstDraw: 14.2));
        correction["correction"] = true;

        var refused = await PostBatchAsync(lab, correction, HttpStatusCode.UnprocessableEntity);

        Assert.Equal(new HashSet<string> { "correctionReason" }, ProblemKeys(refused));
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task Batch_CorrectionOfUnknownBatch_422AndNothingWritten()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var before = FootprintOf(app);
        var correction = Batch("NEVER-POSTED", BothBottles(kit));
        correction["correction"] = true;
        correction["correctionReason"] = "Recalculated after dilution.";

        var refused = await PostBatchAsync(lab, correction, HttpStatusCode.UnprocessableEntity);

        Assert.Equal(new HashSet<string> { "correction" }, ProblemKeys(refused));
        Assert.Contains("NEVER-POSTED", refused["errors"]!["correction"]![0]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Equal(before, FootprintOf(app));
        Assert.Equal("received", await KitStateAsync(coordinator, kit));
    }

    [Fact]
    public async Task Batch_CorrectionLeavingOutARow_422NamingEachRowAndNothingWritten()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var (kept, leftOut) = (await ReceivedKitAsync(coordinator, lab), await ReceivedKitAsync(coordinator, lab));
        await PostBatchAsync(lab, Batch("CORR-3", [.. BothBottles(kept), .. BothBottles(leftOut)]), HttpStatusCode.Created);
        var before = FootprintOf(app);
        // The lab corrects one kit and leaves the other kit's two rows out, as if that were a withdrawal.
        var correction = Batch("CORR-3", BothBottles(kept, firstDraw: 14.2));
        (correction["correction"], correction["correctionReason"]) = (true, "Re-ran the first draw after a dilution error.");

        var refused = await PostBatchAsync(lab, correction, HttpStatusCode.UnprocessableEntity);

        Assert.Equal(new HashSet<string> { "results" }, ProblemKeys(refused));
        var reasons = refused["errors"]!["results"]!.AsArray().Select(r => r!.GetValue<string>()).ToList();
        Assert.Equal(2, reasons.Count);
        Assert.Contains(reasons, r => r.Contains($"lead result for kit {leftOut}, first-draw", StringComparison.Ordinal));
        Assert.Contains(reasons, r => r.Contains($"lead result for kit {leftOut}, flushed", StringComparison.Ordinal));
        Assert.Equal(before, FootprintOf(app));

        // Restating the untouched rows makes it a correction like any other.
        var whole = Batch("CORR-3", [.. BothBottles(kept, firstDraw: 14.2), .. BothBottles(leftOut)]);
        (whole["correction"], whole["correctionReason"]) = (true, "Re-ran the first draw after a dilution error.");
        await PostBatchAsync(lab, whole, HttpStatusCode.Created);
    }

    [Fact]
    public async Task Batch_CorrectionOfAHeldBatchLeavingOutARow_Accepted()
    {
        // Held rows never took effect, so leaving one out withdraws nothing that is in use: the lab may drop it.
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var (kept, dropped) = (await ReceivedKitAsync(coordinator, lab), await ReceivedKitAsync(coordinator, lab));
        var failingQc = new[] { Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 8.0, expected: 10.0) };
        await PostBatchAsync(lab, Batch("CORR-4", [.. BothBottles(kept), .. BothBottles(dropped)], failingQc), HttpStatusCode.Created);
        var correction = Batch("CORR-4", BothBottles(kept));
        (correction["correction"], correction["correctionReason"]) = (true, "The second kit's bottles were never in this run.");

        var outcome = await PostBatchAsync(lab, correction, HttpStatusCode.Created);

        Assert.Equal("accepted", outcome["status"]!.GetValue<string>());
        await AssertAnalyzedAsync(coordinator, kept);
        Assert.Equal("received", await KitStateAsync(coordinator, dropped));
    }

    [Fact]
    public async Task Batch_CorrectionLeavingOutAClosedKitsRows_Accepted()
    {
        // A closed kit takes no results, so its rows could not be restated: they are not asked for.
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var (open, closed) = (await ReceivedKitAsync(coordinator, lab), await ReceivedKitAsync(coordinator, lab));
        await PostBatchAsync(lab, Batch("CORR-5", [.. BothBottles(open), .. BothBottles(closed)]), HttpStatusCode.Created);
        app.WithDb(db =>
        {
            foreach (var k in db.Kits.Where(k => k.Code == closed)) k.State = KitState.Closed;
            return db.SaveChanges();
        });
        var correction = Batch("CORR-5", BothBottles(open, firstDraw: 14.2));
        (correction["correction"], correction["correctionReason"]) = (true, "Re-ran the first draw after a dilution error.");

        await PostBatchAsync(lab, correction, HttpStatusCode.Created);
    }
}
