using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.Interpretation;
using Microsoft.EntityFrameworkCore;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// Two service instances on one database, as behind a load balancer: nothing may live only in one process.
/// On the SQLite run both share one file; on the PostgreSQL run, one server database.
/// </summary>
public class TwoInstancesTests
{
    [Fact]
    public async Task TwoInstances_StartingTogetherOnAnEmptyDatabase_BothMigrateAndServe()
    {
        using var empty = TestStore.CreateEmptyDatabase();
        using var a = new CommunityLeadFactory(sharedConnectionString: empty.ConnectionString);
        using var b = new CommunityLeadFactory(sharedConnectionString: empty.ConnectionString);

        // Starting a host applies migrations; EF Core's migration lock must make the second wait, not fail.
        var clients = await Task.WhenAll(Task.Run(() => a.CreateClient()), Task.Run(() => b.CreateClient()));

        foreach (var client in clients) Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/health")).StatusCode);
        var applied = a.WithDb(db => db.Database.GetAppliedMigrations().ToList());
        Assert.Equal(a.WithDb(db => db.Database.GetMigrations().ToList()), applied);
        await IssueKitAsync(b.CreateClient(Roles.Coordinator));
        Assert.Equal(1, a.WithDb(db => db.Kits.Count()));
        // A first start is clean: no failed query logged as an error by either instance.
        Assert.True(a.Errors.Entries.Count == 0, string.Join("\n", a.Errors.Entries));
        Assert.True(b.Errors.Entries.Count == 0, string.Join("\n", b.Errors.Entries));
    }

    [Fact]
    public async Task TwoInstances_KeyMadeOnOne_SignsInOnTheOther_AndRevokedOnOne_IsRefusedByTheOther()
    {
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var key = a.CreateKey(Roles.Coordinator, "front-desk");
        var onB = b.CreateClient();
        onB.DefaultRequestHeaders.Authorization = new("Bearer", key);
        Assert.Equal(HttpStatusCode.OK, (await onB.GetAsync("/api/kits")).StatusCode);

        var admin = a.CreateClient(Roles.Admin);
        var keyId = key.Split('_')[1];
        a.WithDb(db => db.ApiKeys.Where(k => k.KeyId == keyId).ExecuteUpdate(s => s.SetProperty(k => k.RevokedAtUtc, DateTime.UtcNow)));
        // B verified the key a moment ago and trusts that for VerifiedKeys.Lifetime (10 s) without a look-up; once that
        // has passed on B's clock, the revocation made on A is in force on B.
        b.Clock.Now += VerifiedKeys.Lifetime + TimeSpan.FromSeconds(1);
        Assert.Equal(HttpStatusCode.Unauthorized, (await onB.GetAsync("/api/kits")).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await admin.GetAsync("/api/admin/keys")).StatusCode);
    }

    [Fact]
    public async Task TwoInstances_RacingMovesOnOneKit_ExactlyOneWinsAcrossBoth()
    {
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var onA = a.CreateClient(Roles.Coordinator);
        var onB = b.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(onA);

        var moves = Enumerable.Range(0, 8).Select(i =>
            (i % 2 == 0 ? onA : onB).PostAsJsonAsync($"/api/kits/{code}/cancel", new { reason = $"attempt {i}" }));
        var statuses = (await Task.WhenAll(moves)).Select(r => r.StatusCode).ToList();

        Assert.Equal(1, statuses.Count(s => s == HttpStatusCode.OK));
        Assert.All(statuses.Where(s => s != HttpStatusCode.OK), s => Assert.Equal(HttpStatusCode.Conflict, s));
        Assert.Equal(1, a.WithDb(db => db.AuditTrail.Count(e => e.Action == "cancel")));
    }

    [Fact]
    public async Task TwoInstances_SameBatchPostedToBoth_IsStoredOnce()
    {
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var code = await new ResultsFlow(a).ReceivedKitAsync();
        var batch = Batch("B-TWICE-1", BothBottles(code, firstDraw: 4.2, flushed: 1.1));

        var posts = new[] { a, b, a, b }.Select(app => app.CreateClient(Roles.Lab).PostAsJsonAsync("/api/lab/batches", batch));
        var statuses = (await Task.WhenAll(posts)).Select(r => r.StatusCode).ToList();

        // One post stores the batch; the others are repeats (200) or lost the race cleanly (409), never a 500.
        Assert.Equal(1, statuses.Count(s => s == HttpStatusCode.Created));
        Assert.All(statuses, s => Assert.Contains(s, new[] { HttpStatusCode.Created, HttpStatusCode.OK, HttpStatusCode.Conflict }));
        Assert.Equal(1, a.WithDb(db => db.LabBatches.Count(x => x.BatchId == "B-TWICE-1")));
        Assert.Equal(2, a.WithDb(db => db.LabResults.Count()));
        // The instance that stored nothing serves the stored interpretation of the one result set.
        var interpretation = await GetAsync(b.CreateClient(Roles.Coordinator), $"/api/kits/{code}/interpretation");
        Assert.False(interpretation["provisional"]!.GetValue<bool>());
        Assert.Equal(2, interpretation["findings"]!.AsArray().Count);
    }

    [Fact]
    public async Task TwoInstances_BatchesForDifferentBottlesOfOneKitAtOnce_KitAlwaysEndsAnalyzed()
    {
        // Each batch alone covers one bottle; only together do they make the kit analyzed. Posted at the same
        // moment, neither may miss the other's rows for good: one may lose the race (409) and is posted again.
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var flow = new ResultsFlow(a);
        var kits = new List<string>();
        for (var i = 0; i < 8; i++) kits.Add(await flow.ReceivedKitAsync());

        await Task.WhenAll(kits.Select(async (code, i) =>
        {
            var posts = new[] { (a, "first-draw", 7.5), (b, "flushed", 2.5) }.Select(async bottle =>
            {
                var body = Batch($"SPLIT-{i}-{bottle.Item2}", [Result(code, bottle.Item2, bottle.Item3)]);
                var lab = bottle.Item1.CreateClient(Roles.Lab);
                var response = await lab.PostAsJsonAsync("/api/lab/batches", body);
                if (response.StatusCode == HttpStatusCode.Conflict) response = await lab.PostAsJsonAsync("/api/lab/batches", body);
                Assert.Contains(response.StatusCode, new[] { HttpStatusCode.Created, HttpStatusCode.OK });
            });
            await Task.WhenAll(posts);
        }));

        foreach (var code in kits)
            Assert.NotEqual("received", (await GetAsync(flow.Coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task TwoInstances_HeldBatchReleasedByTwoCoordinatorsAtOnce_OneReleaseOnRecord()
    {
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var flow = new ResultsFlow(a);
        var held = await flow.PostLeadAsync(await flow.ReceivedKitAsync(), firstDraw: 12, flushed: 3, calibration: 7.5);
        var path = $"/api/lab/batches/{held["batchId"]}/release";

        var releases = new[] { a, b, a, b }.Select((app, i) =>
            app.CreateClient(Roles.Coordinator).PostAsJsonAsync(path, new { reason = $"The lab explained the check ({i})." }));
        var statuses = (await Task.WhenAll(releases)).Select(r => r.StatusCode).ToList();

        Assert.Equal(1, statuses.Count(s => s == HttpStatusCode.OK));
        Assert.All(statuses.Where(s => s != HttpStatusCode.OK), s => Assert.Equal(HttpStatusCode.Conflict, s));
        Assert.Equal(1, a.WithDb(db => db.AuditTrail.Count(e => e.Action == "release")));
    }

    [Fact]
    public async Task TwoInstances_AttentionItemResolvedTwiceAtOnce_OneNoteWins()
    {
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var flow = new ResultsFlow(a);
        await flow.PostLeadAsync(await flow.ReceivedKitAsync(), firstDraw: 80, flushed: 20);
        var id = a.WithDb(db => db.Attention.Select(x => x.Id).First());

        var resolves = new[] { a, b, a, b }.Select((app, i) =>
            app.CreateClient(Roles.Coordinator).PostAsJsonAsync($"/api/attention/{id}/resolve", new { note = $"Called the household ({i})." }));
        var statuses = (await Task.WhenAll(resolves)).Select(r => r.StatusCode).ToList();

        Assert.Equal(1, statuses.Count(s => s == HttpStatusCode.NoContent));
        Assert.All(statuses.Where(s => s != HttpStatusCode.NoContent), s => Assert.Equal(HttpStatusCode.Conflict, s));
        Assert.Equal(1, a.WithDb(db => db.AuditTrail.Count(e => e.Action == "resolve-attention")));
    }

    [Fact]
    public async Task TwoInstances_SameLetterRenderedAtOnce_RecordedOnce()
    {
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var flow = new ResultsFlow(a);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 4, flushed: 1.5);

        var renders = new[] { a, b, a, b, a, b }.Select(app => app.CreateClient(Roles.Coordinator).GetAsync($"/api/kits/{code}/letter"));
        var responses = await Task.WhenAll(renders);

        Assert.All(responses, r => Assert.Equal(HttpStatusCode.OK, r.StatusCode));
        Assert.Single(responses.Select(r => r.Headers.GetValues("X-Letter-Id").Single()).Distinct());
        Assert.Equal(1, a.WithDb(db => db.Letters.Count()));
    }
}
