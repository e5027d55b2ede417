using System.Diagnostics;
using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.LabResults;
using Microsoft.EntityFrameworkCore;
using Xunit.Abstractions;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Infrastructure.Fuzz;

/// <summary>
/// Seeded, bounded fuzzing through the real HTTP pipeline, one app for every case: sign-up, collection, lab batches as
/// JSON and CSV, the MDL and the health report get valid bodies changed a little, extreme numbers, nulls in lists,
/// wrong types, huge text and bad dates. Every answer must be a 2xx or a 4xx problem details, and afterwards the
/// database must hold exactly what the 2xx answers said was stored, nothing from a refusal.
/// </summary>
public sealed class FuzzTests(ITestOutputHelper output)
{
    /// <summary>Fixed, so a failure is the same failure on the next run (kit codes aside, which the service draws).</summary>
    private const int Seed = 20261203;

    public static readonly (FuzzRoute Route, int Cases)[] Plan =
    [
        (FuzzRoute.SignUp, 2_400), (FuzzRoute.Collection, 2_000), (FuzzRoute.LabJson, 2_000), (FuzzRoute.LabCsv, 1_600),
        (FuzzRoute.Mdl, 1_000), (FuzzRoute.Report, 1_000),
    ];

    [Fact]
    public async Task Fuzz_TenThousandChangedRequests_Only2xxOr4xxProblemsAndExactlyTheAcceptedRowsStored()
    {
        using var app = new CommunityLeadFactory(now: new DateTimeOffset(2026, 4, 1, 12, 0, 0, TimeSpan.Zero));
        var clients = new[] { Roles.Coordinator, Roles.Lab, Roles.Health }.ToDictionary(r => r, app.CreateClient);
        var kits = await MakeKitsAsync(app, clients[Roles.Coordinator], clients[Roles.Lab]);
        var before = StoreCounts.Of(app);
        var start = new DateTime(2026, 4, 10, 12, 0, 0, DateTimeKind.Utc);
        var random = new Random(Seed);
        var cases = new FuzzCases(random, kits);
        var order = Plan.SelectMany(p => Enumerable.Repeat(p.Route, p.Cases)).OrderBy(_ => random.Next()).ToList();
        var ledger = new FuzzLedger();
        var timer = Stopwatch.StartNew();
        var spent = new Dictionary<FuzzRoute, TimeSpan>();

        for (var i = 0; i < order.Count; i++)
        {
            var fuzz = order[i] switch
            {
                FuzzRoute.SignUp => cases.SignUp(), FuzzRoute.Collection => cases.Collection(), FuzzRoute.LabJson => cases.LabJson(),
                FuzzRoute.LabCsv => cases.LabCsv(), FuzzRoute.Mdl => cases.Mdl(), _ => cases.Report(),
            };
            // One second of the test clock per case: every row written carries the moment of the case that wrote it.
            var at = start.AddSeconds(i);
            app.Clock.Now = at;
            var began = timer.Elapsed;
            try
            {
                using var response = await clients[fuzz.Role].SendAsync(fuzz.Request());
                await ledger.RecordAsync(fuzz, response, at);
            }
            catch (HttpRequestException e)
            {
                ledger.Crashed(fuzz, e);
            }
            spent[fuzz.Route] = spent.GetValueOrDefault(fuzz.Route) + (timer.Elapsed - began);
        }
        output.WriteLine($"{order.Count} cases in {timer.Elapsed.TotalSeconds:0.0} s on {(TestStore.IsPostgres ? "PostgreSQL" : "SQLite")}; accepted: " +
            string.Join(", ", Plan.Select(p => $"{p.Route} {ledger.Accepted(p.Route)}/{p.Cases} in {spent.GetValueOrDefault(p.Route).TotalSeconds:0.0} s")));

        Assert.True(order.Count >= 10_000);
        Assert.True(ledger.Failures.Count == 0, string.Join("\n", ledger.Failures));
        Assert.Empty(app.Errors.Entries);
        // Each route also took some of its cases, or "nothing but what was accepted" would prove little. (Sign-up is
        // left out: a stricter household check may in time refuse the fixture's area.)
        foreach (var route in new[] { FuzzRoute.Collection, FuzzRoute.LabJson, FuzzRoute.LabCsv, FuzzRoute.Mdl, FuzzRoute.Report })
            Assert.True(ledger.Accepted(route) > 0, $"No {route} case was accepted.");
        StoreCounts.Of(app).AssertGrewBy(before, ledger);
        AssertRowsTraceToAcceptedCases(app, start, ledger);
    }

    /// <summary>Every row made during the fuzz carries the moment of a 2xx write; every 2xx write left an audit entry.</summary>
    private static void AssertRowsTraceToAcceptedCases(CommunityLeadFactory app, DateTime start, FuzzLedger ledger)
    {
        var allowed = ledger.WriteTimes.Union(ledger.MayWriteTimes).ToHashSet();
        var written = app.WithDb(db => new Dictionary<string, List<DateTime>>
        {
            ["audit"] = db.AuditTrail.Where(a => a.AtUtc >= start).Select(a => a.AtUtc).ToList(),
            ["households"] = db.Households.Where(h => h.CreatedAtUtc >= start).Select(h => h.CreatedAtUtc).ToList(),
            ["collections"] = db.Collections.Where(c => c.RecordedAtUtc >= start).Select(c => c.RecordedAtUtc).ToList(),
            ["batches"] = db.LabBatches.Where(b => b.PostedAtUtc >= start).Select(b => b.PostedAtUtc).ToList(),
            ["interpretations"] = db.Interpretations.Where(k => k.CreatedAtUtc >= start).Select(k => k.CreatedAtUtc).ToList(),
            ["attention"] = db.Attention.Where(a => a.RaisedAtUtc >= start).Select(a => a.RaisedAtUtc).ToList(),
        });
        foreach (var (table, times) in written)
            Assert.True(times.All(allowed.Contains), $"{table}: rows at {string.Join(", ", times.Where(t => !allowed.Contains(t)).Take(5))}, when no write was accepted");
        var audited = written["audit"].ToHashSet();
        Assert.True(ledger.WriteTimes.All(audited.Contains), "An accepted write left no audit entry.");
    }

    private static async Task<FuzzKits> MakeKitsAsync(CommunityLeadFactory app, HttpClient coordinator, HttpClient lab)
    {
        var toCollect = new List<(string, string)>();
        foreach (var kind in Enumerable.Repeat("water", 12).Concat(Enumerable.Repeat("water-sequential", 4)).Concat(Enumerable.Repeat("soil", 4)))
            toCollect.Add((await IssueKitAsync(coordinator, kind: kind), kind));
        var forLab = new List<string>();
        for (var i = 0; i < 8; i++) forLab.Add(await IssueKitAsync(coordinator));
        // Collected on 2026-04-03 and received on the 4th, after they were issued on the 1st.
        app.Clock.Now = new DateTimeOffset(2026, 4, 5, 12, 0, 0, TimeSpan.Zero);
        foreach (var code in forLab)
        {
            await PostAsync(coordinator, $"/api/kits/{code}/collection", GoodWaterCollection(), HttpStatusCode.OK);
            await PostAsync(lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
        }
        return new FuzzKits(toCollect, forLab);
    }
}

/// <summary>Rows of the tables the fuzzed routes write directly.</summary>
internal sealed record StoreCounts(int Households, int Collections, int Samples, int Batches, int Results, int Qc)
{
    public static StoreCounts Of(CommunityLeadFactory app) => app.WithDb(db => new StoreCounts(db.Households.Count(),
        db.Collections.Count(), db.Samples.Count(), db.LabBatches.Count(), db.LabResults.Count(), db.LabQc.Count()));

    public void AssertGrewBy(StoreCounts before, FuzzLedger accepted) => Assert.Equal(
        before with
        {
            Households = before.Households + accepted.Households, Collections = before.Collections + accepted.Collections,
            Samples = before.Samples + accepted.Samples, Batches = before.Batches + accepted.Batches,
            Results = before.Results + accepted.Results, Qc = before.Qc + accepted.QcRows,
        }, this);
}
