using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// The lab receives a kit before the coordinator typed in its collection form: its results are kept and wait, with
/// an attention item, and are interpreted as soon as the form is recorded. Nothing the lab sent is lost.
/// </summary>
public class WaitingResultsTests
{
    private static async Task<(CommunityLeadFactory App, HttpClient Coordinator, HttpClient Lab, string Kit)> ReceivedWithoutFormAsync()
    {
        var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await IssueKitAsync(coordinator);
        await PostAsync(lab, $"/api/kits/{kit}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
        return (app, coordinator, lab, kit);
    }

    [Fact]
    public async Task Results_KitWithoutCollection_KeptWaitingWithAnAttentionItemThenInterpretedOnceTheFormIsRecorded()
    {
        var (app, coordinator, lab, kit) = await ReceivedWithoutFormAsync();
        using var _ = app;

        await PostBatchAsync(lab, Batch("WAIT-1", BothBottles(kit, firstDraw: 62, flushed: 4)), HttpStatusCode.Created);

        Assert.Equal("received", (await GetAsync(coordinator, $"/api/kits/{kit}"))["state"]!.GetValue<string>());
        Assert.Equal(2, app.WithDb(db => db.LabResults.Count(r => r.KitCode == kit && r.CollectedAt == null)));
        var item = await coordinator.GetStringAsync("/api/attention");
        Assert.Contains("awaiting-collection", item);
        Assert.Contains("Highest lead: 62 µg/L", item);

        var recorded = await PostAsync(coordinator, $"/api/kits/{kit}/collection", GoodWaterCollection(), HttpStatusCode.OK);

        Assert.Equal("interpreted", recorded["state"]!.GetValue<string>());
        Assert.Equal("urgent", (await GetAsync(coordinator, $"/api/kits/{kit}/interpretation"))["band"]!.GetValue<string>());
        Assert.Equal(0, app.WithDb(db => db.LabResults.Count(r => r.KitCode == kit && r.CollectedAt == null)));
        var open = app.WithDb(db => db.Attention.Where(a => a.KitCode == kit && a.ResolvedAtUtc == null).Select(a => a.Reason).ToList());
        Assert.DoesNotContain(AttentionFlag.AwaitingCollection, open);
        Assert.Contains(AttentionFlag.Urgent, open);
    }

    [Fact]
    public async Task Collection_DatedAfterTheLabAnalyzedTheWaitingBottle_400NamingTheBottleAndResultsStillWaiting()
    {
        var (app, coordinator, lab, kit) = await ReceivedWithoutFormAsync();
        using var _ = app;
        await PostBatchAsync(lab, Batch("WAIT-2", BothBottles(kit), analyzedAt: "2026-04-03T06:03:00+00:00"), HttpStatusCode.Created);

        // The flushed bottle (06:05) is dated after the analysis (06:03); the first draw (06:00) is not.
        var problem = await BadInput.ExpectFieldError(
            await coordinator.PostAsJsonAsync($"/api/kits/{kit}/collection", GoodWaterCollection()), "samples[1].collectedAt");

        Assert.Equal(["samples[1].collectedAt"], problem["errors"]!.AsObject().Select(e => e.Key));
        Assert.Equal(0, app.WithDb(db => db.Collections.Count()));
        Assert.Equal(2, app.WithDb(db => db.LabResults.Count(r => r.KitCode == kit && r.CollectedAt == null)));
    }

    [Fact]
    public async Task Results_BottleTheKitKindHasNot_422NamingIt()
    {
        var (app, _, lab, kit) = await ReceivedWithoutFormAsync();
        using var __ = app;

        var problem = await PostBatchAsync(lab, Batch("WAIT-3", [Result(kit, "sequential", 3.0)]), HttpStatusCode.UnprocessableEntity);

        Assert.Contains("/results/0/bottle", problem["errors"]!.AsObject().Select(e => e.Key));
        Assert.Equal(0, app.WithDb(db => db.LabResults.Count()));
    }
}
