using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Households;

/// <summary>
/// Two staff members editing one home: the ETag of a read, sent back as If-Match, refuses an edit made on
/// details someone else has changed since (RFC 9110 §13.1.1: 412 Precondition Failed).
/// </summary>
public class HouseholdEditConflictTests
{
    private static async Task<string> ETagAsync(HttpClient coordinator, string id)
    {
        var response = await coordinator.GetAsync($"/api/households/{id}");
        await Expect(response, HttpStatusCode.OK);
        return Assert.Single(response.Headers.GetValues("ETag"));
    }

    private static Task<HttpResponseMessage> PutAsync(HttpClient coordinator, string id, JsonObject body, string? ifMatch)
    {
        var request = new HttpRequestMessage(HttpMethod.Put, $"/api/households/{id}") { Content = JsonContent.Create(body) };
        if (ifMatch is not null) request.Headers.TryAddWithoutValidation("If-Match", ifMatch);
        return coordinator.SendAsync(request);
    }

    [Fact]
    public async Task Edit_WithTheETagOfTheLatestRead_SavedAndTheETagMovesOn()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var id = await SignUpAsync(coordinator);
        var before = await ETagAsync(coordinator, id);

        var saved = await PutAsync(coordinator, id, Household(h => h["phone"] = "+1 555 0199"), before);

        await Expect(saved, HttpStatusCode.NoContent);
        var after = await ETagAsync(coordinator, id);
        Assert.NotEqual(before, after);
        Assert.Equal(after, Assert.Single(saved.Headers.GetValues("ETag")));
    }

    [Fact]
    public async Task Edit_OnStaleDetails_412AndTheOtherEditKept()
    {
        using var app = new CommunityLeadFactory();
        var (first, second) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Coordinator));
        var id = await SignUpAsync(first);
        var bothRead = await ETagAsync(first, id);
        await Expect(await PutAsync(first, id, Household(h => h["phone"] = "+1 555 0111"), bothRead), HttpStatusCode.NoContent);

        var stale = await PutAsync(second, id, Household(h => h["email"] = "new@example.org"), bothRead);

        await Expect(stale, HttpStatusCode.PreconditionFailed);
        var problem = JsonNode.Parse(await stale.Content.ReadAsStringAsync())!;
        Assert.Equal(412, problem["status"]!.GetValue<int>());
        Assert.Equal(await ETagAsync(first, id), Assert.Single(stale.Headers.GetValues("ETag")));
        var stored = await GetAsync(first, $"/api/households/{id}");
        Assert.Equal("+1 555 0111", stored["phone"]!.GetValue<string>());
        Assert.Equal("marisol@example.org", stored["email"]!.GetValue<string>());
    }

    [Fact]
    public async Task Edit_WithoutIfMatch_LastEditWinsAsBefore()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var id = await SignUpAsync(coordinator);

        await Expect(await PutAsync(coordinator, id, Household(h => h["phone"] = "+1 555 0122"), null), HttpStatusCode.NoContent);
        await Expect(await PutAsync(coordinator, id, Household(h => h["phone"] = "+1 555 0133"), "*"), HttpStatusCode.NoContent);

        Assert.Equal("+1 555 0133", (await GetAsync(coordinator, $"/api/households/{id}"))["phone"]!.GetValue<string>());
    }

    [Fact]
    public async Task Edit_SameReadSavedByTwoInstancesAtOnce_OneWinsTheOther412()
    {
        using var a = new CommunityLeadFactory();
        using var b = new CommunityLeadFactory(sharedConnectionString: a.ConnectionString);
        var id = await SignUpAsync(a.CreateClient(Roles.Coordinator));
        var read = await ETagAsync(a.CreateClient(Roles.Coordinator), id);

        var edits = new[] { (a, "+1 555 0144"), (b, "+1 555 0155"), (a, "+1 555 0166"), (b, "+1 555 0177") }
            .Select(e => PutAsync(e.Item1.CreateClient(Roles.Coordinator), id, Household(h => h["phone"] = e.Item2), read));
        var statuses = (await Task.WhenAll(edits)).Select(r => r.StatusCode).ToList();

        Assert.Equal(1, statuses.Count(s => s == HttpStatusCode.NoContent));
        Assert.All(statuses.Where(s => s != HttpStatusCode.NoContent), s => Assert.Equal(HttpStatusCode.PreconditionFailed, s));
        Assert.Equal(1, a.WithDb(db => db.AuditTrail.Count(e => e.Action == "update")));
    }
}
