using System.Diagnostics;
using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Xunit.Abstractions;
using static CommunityLead.Tests.Features.Interpretation.RepairFixtures;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;
using Mode = CommunityLead.Tests.Features.LabResults.InterruptAfterResultsSaved.Mode;
using UninterpretedResults = CommunityLead.Tests.Features.Interpretation.UninterpretedResults;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// Results saved, interpretation lost: once a batch is being written, neither a client going away (a lab's
/// timeout on a large batch) nor the process ending may leave kits analyzed with no interpretation and no
/// attention item, and the lab's repeated post repairs a store left so before.
/// </summary>
public class NothingLostTests(ITestOutputHelper output)
{
    private const int KitCount = 12;

    [Fact]
    public async Task BatchIntake_ClientDisconnectsRightAfterResultsSaved_EveryKitInterpretedWithItsAttentionItems()
    {
        InterruptAfterResultsSaved? hook = null;
        using var app = new CommunityLeadFactory(services: s => hook = InterruptAfterResultsSaved.Install(s, Mode.ClientDisconnects));
        var codes = await ReceivedKitsAsync(app, KitCount);
        var lab = app.CreateClient(Roles.Lab);

        await Assert.ThrowsAnyAsync<Exception>(() => lab.PostAsJsonAsync("/api/lab/batches", UrgentBatch("GONE-1", codes)));
        var waited = await WaitUntilInterpretedAsync(app, codes);

        output.WriteLine($"{KitCount} kits interpreted {waited.TotalMilliseconds:N0} ms after the client was gone");
        Assert.Equal(1, hook!.Interruptions);
        Assert.True(hook.TokenCancelled, "the abort must cancel the request's token, or this test tries nothing");
        AssertInterpretedOnceWithAttention(app, codes);
    }

    [Fact]
    public async Task BatchRelease_ClientDisconnectsRightAfterReleaseSaved_EveryKitInterpretedWithItsAttentionItems()
    {
        InterruptAfterResultsSaved? hook = null;
        using var app = new CommunityLeadFactory(services: s => hook = InterruptAfterResultsSaved.Install(s, Mode.ClientDisconnects));
        var codes = await ReceivedKitsAsync(app, KitCount);
        hook!.Armed = false;
        // A calibration check recovering 80 % fails its 90–110 % window, so the batch is held.
        await PostBatchAsync(app.CreateClient(Roles.Lab), UrgentBatch("HELD-GONE-1", codes, calibration: 8.0), HttpStatusCode.Created);
        hook.Armed = true;
        var coordinator = app.CreateClient(Roles.Coordinator);

        await Assert.ThrowsAnyAsync<Exception>(() => coordinator.PostAsJsonAsync("/api/lab/batches/HELD-GONE-1/release",
            new { reason = "The lab re-ran the calibration check; the samples were bracketed by passing checks." }));
        var waited = await WaitUntilInterpretedAsync(app, codes);

        output.WriteLine($"{KitCount} kits interpreted {waited.TotalMilliseconds:N0} ms after the coordinator's client was gone");
        Assert.Equal(1, hook.Interruptions);
        Assert.True(hook.TokenCancelled);
        AssertInterpretedOnceWithAttention(app, codes);
    }

    [Fact]
    public async Task BatchIntake_ProcessEndsAfterResultsSavedBeforeInterpretation_NothingStoredAndPostingAgainInterprets()
    {
        InterruptAfterResultsSaved? hook = null;
        using var app = new CommunityLeadFactory(services: s => hook = InterruptAfterResultsSaved.Install(s, Mode.ProcessDies));
        var codes = await ReceivedKitsAsync(app, KitCount);
        var lab = app.CreateClient(Roles.Lab);
        var before = FootprintOf(app);

        await lab.PostAsJsonAsync("/api/lab/batches", UrgentBatch("DIED-1", codes));

        // Results and interpretation are one transaction: ended between the two, the database keeps neither.
        Assert.Equal(1, hook!.Interruptions);
        Assert.Equal(before, FootprintOf(app));
        hook.Armed = false;
        // So the lab's retry is a first post (201), not a repeat answered from a half-written store.
        await PostBatchAsync(lab, UrgentBatch("DIED-1", codes), HttpStatusCode.Created);
        AssertInterpretedOnceWithAttention(app, codes);
    }

    [Fact]
    public async Task BatchIntake_PostedAgainOverResultsLeftUninterpreted_200AndEveryKitRepairedAndLogged()
    {
        var log = new CapturedLog();
        using var app = new CommunityLeadFactory(services: s => s.AddSingleton<ILoggerProvider>(log));
        var codes = await ReceivedKitsAsync(app, KitCount);
        var batch = UrgentBatch("RETRY-AFTER-TIMEOUT-1", codes);
        await UninterpretedResults.CommitAsync(app, batch);
        AssertLeftAnalyzed(app, codes);
        var lab = app.CreateClient(Roles.Lab);

        var clock = Stopwatch.StartNew();
        var again = await PostBatchAsync(lab, batch, HttpStatusCode.OK);
        clock.Stop();

        output.WriteLine($"repeated post repairing {KitCount} kits took {clock.ElapsedMilliseconds:N0} ms");
        Assert.Equal(1, again["version"]!.GetValue<int>());
        AssertInterpretedOnceWithAttention(app, codes);
        Assert.Equal(codes.Order(), RepairedCodes(log).Order());
        // Posted once more, there is nothing left to repair: a plain repeat that writes nothing.
        var repaired = RepairFootprint(app);
        await PostBatchAsync(lab, batch, HttpStatusCode.OK);
        Assert.Equal(repaired, RepairFootprint(app));
    }
}
