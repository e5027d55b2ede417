using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using Microsoft.EntityFrameworkCore;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Infrastructure;

public class StorageTests
{
    [Fact]
    public async Task Storage_ManyConcurrentWrites_NoneFailsWithDatabaseLocked()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var householdId = await SignUpAsync(coordinator);
        var writes = Enumerable.Range(0, 40).Select(i => i % 2 == 0
            ? coordinator.PostAsJsonAsync("/api/households", Household())
            : coordinator.PostAsJsonAsync("/api/kits", new { householdId, kind = "water" }));
        var responses = await Task.WhenAll(writes);
        Assert.All(responses, r => Assert.Equal(HttpStatusCode.Created, r.StatusCode));
        Assert.Equal(21, app.WithDb(db => db.Households.Count()));
        Assert.Equal(20, app.WithDb(db => db.Kits.Count()));
    }

    [Fact]
    public async Task Storage_ConcurrentMovesOnOneKit_ExactlyOneWinsTheRest409()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var moves = Enumerable.Range(0, 8).Select(i =>
            coordinator.PostAsJsonAsync($"/api/kits/{code}/cancel", new { reason = $"attempt {i}" }));
        var statuses = (await Task.WhenAll(moves)).Select(r => r.StatusCode).ToList();
        Assert.Equal(1, statuses.Count(s => s == HttpStatusCode.OK));
        Assert.All(statuses.Where(s => s != HttpStatusCode.OK), s => Assert.Equal(HttpStatusCode.Conflict, s));
        Assert.Equal(1, app.WithDb(db => db.AuditTrail.Count(a => a.Action == "cancel")));
    }

    [SqliteFact]
    public void Storage_Database_RunsInWriteAheadLogMode()
    {
        using var app = new CommunityLeadFactory();
        var mode = app.WithDb(db => db.Database.SqlQueryRaw<string>("PRAGMA journal_mode").AsEnumerable().Single());
        Assert.Equal("wal", mode);
    }

    [Theory]
    [InlineData("UPDATE \"AuditTrail\" SET \"Reason\" = 'rewritten'")]
    [InlineData("DELETE FROM \"AuditTrail\"")]
    public async Task AuditTrail_UpdateOrDelete_RefusedByTheDatabase(string sql)
    {
        using var app = new CommunityLeadFactory();
        await IssueKitAsync(app.CreateClient(Roles.Coordinator));
        var before = app.WithDb(db => db.AuditTrail.Count());
        var error = Assert.ThrowsAny<Exception>(() => app.WithDb(db => db.Database.ExecuteSqlRaw(sql)));
        Assert.Contains("append-only", error.Message);
        Assert.Equal(before, app.WithDb(db => db.AuditTrail.Count()));
    }

    [Fact]
    public async Task Service_HealthAndSwagger_OpenWithoutAKey()
    {
        using var app = new CommunityLeadFactory { Settings = { ["Swagger:Enabled"] = "true" } };
        var anonymous = app.CreateClient();
        Assert.Equal(HttpStatusCode.OK, (await anonymous.GetAsync("/health")).StatusCode);
        var swagger = await anonymous.GetStringAsync("/swagger/v1/swagger.json");
        Assert.Contains("/api/kits/{code}/collection", swagger);
        Assert.Contains("bearer", swagger);
        Assert.Equal(HttpStatusCode.OK, (await anonymous.GetAsync("/swagger/index.html")).StatusCode);
    }
}
