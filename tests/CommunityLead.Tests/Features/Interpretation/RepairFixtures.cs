using System.Diagnostics;
using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Interpretation;

/// <summary>Kits with urgent results, and the checks that each ended interpreted once with its attention items.</summary>
internal static class RepairFixtures
{
    /// <summary>Lead at 75 µg/L is urgent with the shipped setting (Interpretation:UrgentLeadUgL 50, the program's choice).</summary>
    public const double UrgentLead = 75;

    /// <summary>Received water kits of one household (the fixture home: a child under 6, a lead service line).</summary>
    public static async Task<List<string>> ReceivedKitsAsync(CommunityLeadFactory app, int count)
    {
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var household = await SignUpAsync(coordinator);
        var codes = new List<string>();
        for (var i = 0; i < count; i++)
        {
            var code = await IssueKitAsync(coordinator, household);
            await PostAsync(coordinator, $"/api/kits/{code}/collection", GoodWaterCollection(), HttpStatusCode.OK);
            await PostAsync(lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
            codes.Add(code);
        }
        return codes;
    }

    /// <summary>Both bottles of every kit urgent; the QC passes unless <paramref name="calibration"/> (of 10) says otherwise.</summary>
    public static JsonObject UrgentBatch(string batchId, IReadOnlyList<string> codes, double calibration = 10.2)
    {
        // One calibration check per 10 samples [published: EPA Methods 200.7/200.8], and a blank.
        var checks = (codes.Count * 2 + 9) / 10;
        return Batch(batchId, [.. codes.SelectMany(c => BothBottles(c, firstDraw: UrgentLead, flushed: 60))],
            [Qc("calibration-blank", measured: 0.04), .. Enumerable.Range(0, checks).Select(_ => Qc("calibration-check", measured: calibration, expected: 10.0))]);
    }

    /// <summary>Waits (at most 30 s) until every kit is interpreted; returns how long that took.</summary>
    public static async Task<TimeSpan> WaitUntilInterpretedAsync(CommunityLeadFactory app, IReadOnlyList<string> codes)
    {
        var waited = Stopwatch.StartNew();
        while (app.WithDb(db => db.Kits.Count(k => codes.Contains(k.Code) && k.State == KitState.Interpreted)) < codes.Count)
        {
            if (waited.Elapsed > TimeSpan.FromSeconds(30))
                Assert.Fail($"After 30 s, {app.WithDb(db => db.Kits.Count(k => codes.Contains(k.Code) && k.State == KitState.Interpreted))} " +
                            $"of {codes.Count} kits are interpreted.");
            await Task.Delay(50);
        }
        return waited.Elapsed;
    }

    /// <summary>
    /// Each kit interpreted exactly once (one interpretation on record, current, urgent; one interpret move in the
    /// audit trail) with one open urgent item, and no attention item raised twice for a kit.
    /// </summary>
    public static void AssertInterpretedOnceWithAttention(CommunityLeadFactory app, IReadOnlyList<string> codes)
    {
        var (interpretations, current, moves, urgent, repeated) = app.WithDb(db => (
            db.Interpretations.Count(i => codes.Contains(i.KitCode)),
            db.Interpretations.Count(i => codes.Contains(i.KitCode) && i.SupersededAtUtc == null && i.Band == Band.Urgent),
            db.AuditTrail.Count(a => a.Subject == "kit" && codes.Contains(a.SubjectKey) && a.Action == "interpret"),
            db.Attention.Count(a => codes.Contains(a.KitCode) && a.ResolvedAtUtc == null && a.Reason == AttentionFlag.Urgent),
            db.Attention.Where(a => codes.Contains(a.KitCode)).GroupBy(a => new { a.KitCode, a.Reason }).Count(g => g.Count() > 1)));
        Assert.Equal((codes.Count, codes.Count, codes.Count, codes.Count, 0), (interpretations, current, moves, urgent, repeated));
    }

    /// <summary>Kits left analyzed by <see cref="UninterpretedResults"/>: none interpreted, no attention item.</summary>
    public static void AssertLeftAnalyzed(CommunityLeadFactory app, IReadOnlyList<string> codes)
    {
        var (analyzed, items) = app.WithDb(db => (
            db.Kits.Count(k => codes.Contains(k.Code) && k.State == KitState.Analyzed),
            db.Attention.Count(a => codes.Contains(a.KitCode))));
        Assert.Equal((codes.Count, 0), (analyzed, items));
    }

    /// <summary>The kit codes named by "Repaired kit …" log entries, in the order written.</summary>
    public static List<string> RepairedCodes(CapturedLog log) =>
        [.. log.Entries.Where(e => e.Category == typeof(InterpretationRepair).FullName && e.Message.StartsWith("Repaired kit ", StringComparison.Ordinal))
            .Select(e => e.Message["Repaired kit ".Length..].Split(':')[0])];

    public static InterpretationSweep Sweep(CommunityLeadFactory app) => app.Services.GetRequiredService<InterpretationSweep>();

    /// <summary>Every row a repair could write, so "did nothing" can be shown.</summary>
    public static string RepairFootprint(CommunityLeadFactory app) => app.WithDb(db =>
        $"{db.Interpretations.Count()} interpretations, {db.Attention.Count()} attention items, {db.AuditTrail.Count()} audit entries; " +
        string.Join(", ", db.Kits.OrderBy(k => k.Id).Select(k => new { k.Code, k.State, k.Version }).AsEnumerable()
            .Select(k => $"{k.Code} {k.State} v{k.Version}")));
}
