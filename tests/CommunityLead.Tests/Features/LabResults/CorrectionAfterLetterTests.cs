using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

public class CorrectionAfterLetterTests
{
    [Fact]
    public async Task Correction_AfterTheLetterWentOut_KitBackToAnalyzedAndOnTheAttentionList()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var untouched = await ReceivedKitAsync(coordinator, lab);
        await PostBatchAsync(lab, Batch("LETTER-1", [.. BothBottles(kit, firstDraw: 4.2), .. BothBottles(untouched)]),
            HttpStatusCode.Created);
        // There is no letter route yet: the letter is marked as sent directly.
        app.WithDb(db =>
        {
            foreach (var k in db.Kits.Where(k => k.Code == kit || k.Code == untouched)) k.State = KitState.LetterSent;
            return db.SaveChanges();
        });
        // Interpretation may put kits on the list for their levels; none is there for a correction yet.
        Assert.Empty(await CorrectedAfterLetterAsync(coordinator));

        var correction = Batch("LETTER-1", [.. BothBottles(kit, firstDraw: 42.0), .. BothBottles(untouched)]);
        correction["correction"] = true;
        correction["correctionReason"] = "Dilution factor was applied twice to the first-draw bottle.";
        var outcome = await PostBatchAsync(lab, correction, HttpStatusCode.Created);

        Assert.Equal(2, outcome["version"]!.GetValue<int>());
        var move = await AssertAnalyzedAsync(coordinator, kit);
        Assert.Equal("letter-sent", move["from"]!.GetValue<string>());
        // The other kit's figures came back unchanged: its letter still holds, so it is left alone.
        var item = Assert.Single(await CorrectedAfterLetterAsync(coordinator));
        Assert.Equal(kit, item["kitCode"]!.GetValue<string>());
        Assert.Equal("letter-sent", await KitStateAsync(coordinator, untouched));
        Assert.Contains("new letter needed", item["detail"]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Contains("LETTER-1 version 2", item["detail"]!.GetValue<string>(), StringComparison.Ordinal);
        await Expect(await lab.GetAsync("/api/attention"), HttpStatusCode.Forbidden);
    }

    [Fact]
    public async Task HeldResults_ReleasedAfterTheKitWasClosed_KitStaysClosedAndGoesOnTheAttentionList()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        await PostBatchAsync(lab, Batch("FIRST-1", BothBottles(kit, firstDraw: 4.2)), HttpStatusCode.Created);
        app.WithDb(db =>
        {
            foreach (var k in db.Kits.Where(k => k.Code == kit)) k.State = KitState.LetterSent;
            return db.SaveChanges();
        });
        // A re-run comes back with other figures but fails QC and waits; meanwhile the kit is closed.
        await PostBatchAsync(lab, Batch("RERUN-1", BothBottles(kit, firstDraw: 18.0),
            [Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 8.0, expected: 10.0)]), HttpStatusCode.Created);
        await PostAsync(coordinator, $"/api/kits/{kit}/close", null, HttpStatusCode.OK);

        await PostAsync(coordinator, "/api/lab/batches/RERUN-1/release", new { reason = "Lab showed the check was mis-keyed." }, HttpStatusCode.OK);

        Assert.Equal("closed", await KitStateAsync(coordinator, kit));
        var item = Assert.Single(await CorrectedAfterLetterAsync(coordinator));
        Assert.Equal(kit, item["kitCode"]!.GetValue<string>());
        Assert.Contains("stays closed", item["detail"]!.GetValue<string>(), StringComparison.Ordinal);
    }

    private static async Task<List<JsonObject>> CorrectedAfterLetterAsync(HttpClient coordinator) =>
        [.. (await GetArrayAsync(coordinator, "/api/attention")).Select(a => a!.AsObject())
            .Where(a => a["reason"]!.GetValue<string>() == "corrected-after-letter")];
}
