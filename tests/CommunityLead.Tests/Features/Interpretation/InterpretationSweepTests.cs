using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Xunit.Abstractions;
using static CommunityLead.Tests.Features.Interpretation.RepairFixtures;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;

namespace CommunityLead.Tests.Features.Interpretation;

/// <summary>
/// The sweep finds kits whose results are in effect but not interpreted (left so by a disconnected client or a
/// killed process before results and interpretation shared a transaction), interprets each once, and logs it
/// by kit code; on a sound store it does nothing.
/// </summary>
public class InterpretationSweepTests(ITestOutputHelper output)
{
    private const int KitCount = 12;

    [Fact]
    public async Task Sweep_RestartOnStoreLeftWithResultsButNoInterpretation_EveryKitInterpretedWithinSeconds()
    {
        using var store = TestStore.CreateEmptyDatabase();
        List<string> codes;
        using (var killed = new CommunityLeadFactory(sharedConnectionString: store.ConnectionString))
        {
            codes = await ReceivedKitsAsync(killed, KitCount);
            await UninterpretedResults.CommitAsync(killed, UrgentBatch("KILLED-1", codes));
            AssertLeftAnalyzed(killed, codes);
        }
        var log = new CapturedLog();

        using var restarted = new CommunityLeadFactory(sharedConnectionString: store.ConnectionString,
            services: s => s.AddSingleton<ILoggerProvider>(log));
        var started = System.Diagnostics.Stopwatch.StartNew();
        _ = restarted.Services; // starts the service: its start-up sweep runs beside it
        var waited = await WaitUntilInterpretedAsync(restarted, codes);

        output.WriteLine($"after restart, {KitCount} kits interpreted within {waited.TotalMilliseconds:N0} ms " +
                         $"({started.ElapsedMilliseconds:N0} ms including start-up)");
        AssertInterpretedOnceWithAttention(restarted, codes);
        Assert.Equal(codes.Order(), RepairedCodes(log).Order());
    }

    [Fact]
    public async Task Sweep_SoundStoreWithHeldBatchAndCorrections_RepairsNothingAndLogsNothing()
    {
        var log = new CapturedLog();
        using var app = new CommunityLeadFactory(services: s => s.AddSingleton<ILoggerProvider>(log));
        var codes = await ReceivedKitsAsync(app, 3);
        var (restated, corrected, held) = (codes[0], codes[1], codes[2]);
        var lab = app.CreateClient(Roles.Lab);
        await PostBatchAsync(lab, Batch("SOUND-1", [.. BothBottles(restated, 4, 1.5), .. BothBottles(corrected, 12, 3)]), HttpStatusCode.Created);
        await PostBatchAsync(lab, Batch("SOUND-HELD-1", BothBottles(held, 30, 8),
            [Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 8.0, expected: 10.0)]), HttpStatusCode.Created);
        // An hour later the lab corrects one kit and restates the other unchanged: the restated kit's results are now
        // newer than its interpretation, yet its figures are the ones it was interpreted from.
        app.Clock.Now = app.Clock.Now.AddHours(1);
        var correction = Batch("SOUND-1", [.. BothBottles(restated, 4, 1.5), .. BothBottles(corrected, 14, 3)]);
        correction["correction"] = true;
        correction["correctionReason"] = "First-draw bottle of one kit re-analysed after a dilution error.";
        await PostBatchAsync(lab, correction, HttpStatusCode.Created);
        var before = RepairFootprint(app);

        Assert.True(await Sweep(app).SweepOnceAsync(RepairScope.WholeStore, default));

        Assert.Equal(before, RepairFootprint(app));
        Assert.Empty(RepairedCodes(log));
        Assert.DoesNotContain(log.Entries, e => e.Category.StartsWith("CommunityLead.Api.Features.Interpretation", StringComparison.Ordinal)
                                                && e.Level >= LogLevel.Warning);
        Assert.Equal("received", await KitStateAsync(app.CreateClient(Roles.Coordinator), held));
    }

    [Fact]
    public async Task Sweep_KitsLeftAnalyzedOrChangedAfterInterpretation_InterpretsEachAndLogsKitCodesOnly()
    {
        var log = new CapturedLog();
        using var app = new CommunityLeadFactory(services: s => s.AddSingleton<ILoggerProvider>(log));
        var codes = await ReceivedKitsAsync(app, 4);
        var (neverInterpreted, correctedLeftAnalyzed, stateSaysInterpreted, sound) = (codes[0], codes[1], codes[2], codes[3]);
        var lab = app.CreateClient(Roles.Lab);
        await PostBatchAsync(lab, Batch("CHANGED-1", [.. BothBottles(correctedLeftAnalyzed, 4, 1), .. BothBottles(stateSaysInterpreted, 4, 1),
            .. BothBottles(sound, 4, 1)]), HttpStatusCode.Created);
        app.Clock.Now = app.Clock.Now.AddHours(1);
        // Written as the intake did before this fix: results committed, interpretation never run.
        await UninterpretedResults.CommitAsync(app, UrgentBatch("NEVER-1", [neverInterpreted]));
        await UninterpretedResults.CommitAsync(app, UrgentBatch("CHANGED-2", [correctedLeftAnalyzed, stateSaysInterpreted]));
        // A kit whose state says interpreted although its results changed after (a store put right by hand, say).
        app.WithDb(db => db.Kits.Where(k => k.Code == stateSaysInterpreted).ExecuteUpdate(s => s.SetProperty(k => k.State, KitState.Interpreted)));
        var soundInterpretation = app.WithDb(db => db.Interpretations.Single(i => i.KitCode == sound).Id);

        Assert.True(await Sweep(app).SweepOnceAsync(RepairScope.WholeStore, default));

        var repaired = RepairedCodes(log);
        Assert.Equal(new[] { neverInterpreted, correctedLeftAnalyzed, stateSaysInterpreted }.Order(), repaired.Order());
        foreach (var code in repaired)
        {
            var interpretation = await new ResultsFlow(app).InterpretationAsync(code);
            Assert.Equal("urgent", interpretation["band"]!.GetValue<string>());
        }
        var (current, urgent) = app.WithDb(db => (
            db.Interpretations.Count(i => repaired.Contains(i.KitCode) && i.SupersededAtUtc == null),
            db.Attention.Count(a => repaired.Contains(a.KitCode) && a.ResolvedAtUtc == null && a.Reason == CommunityLead.Rules.Interpretation.AttentionFlag.Urgent)));
        Assert.Equal((3, 3), (current, urgent));
        Assert.Equal(soundInterpretation, app.WithDb(db => db.Interpretations.Single(i => i.KitCode == sound && i.SupersededAtUtc == null).Id));
        // Kit codes only: nothing the household told the program reaches the log (the fixture home's details).
        var household = Fixtures.Household();
        string[] personal = [household["name"]!.GetValue<string>(), household["address"]!["line1"]!.GetValue<string>(),
            household["phone"]!.GetValue<string>(), household["email"]!.GetValue<string>()];
        Assert.All(log.Entries, e => Assert.DoesNotContain(personal, value => e.Message.Contains(value, StringComparison.OrdinalIgnoreCase)));
    }

    [Fact]
    public async Task Sweep_TwoInstancesAtOnce_EachKitInterpretedOnceWithoutDuplicateAttentionItems()
    {
        var (logA, logB) = (new CapturedLog(), new CapturedLog());
        using var a = new CommunityLeadFactory(services: s => s.AddSingleton<ILoggerProvider>(logA));
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString, services: s => s.AddSingleton<ILoggerProvider>(logB));
        _ = b.Services;
        var codes = await ReceivedKitsAsync(a, 20);
        await UninterpretedResults.CommitAsync(a, UrgentBatch("TWO-SWEEPS-1", codes));
        AssertLeftAnalyzed(a, codes);

        var clock = System.Diagnostics.Stopwatch.StartNew();
        var sweeps = await Task.WhenAll(Task.Run(() => Sweep(a).SweepOnceAsync(RepairScope.WholeStore, default)),
            Task.Run(() => Sweep(b).SweepOnceAsync(RepairScope.WholeStore, default)));
        clock.Stop();

        output.WriteLine($"two sweeps at once over 20 kits took {clock.ElapsedMilliseconds:N0} ms " +
                         $"(instance a repaired {RepairedCodes(logA).Count}, instance b {RepairedCodes(logB).Count})");
        Assert.Equal([true, true], sweeps);
        AssertInterpretedOnceWithAttention(a, codes);
        Assert.Equal(codes.Order(), RepairedCodes(logA).Concat(RepairedCodes(logB)).Order());
    }
}
