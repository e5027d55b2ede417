using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Households;

public class HouseholdTests
{
    [Fact]
    public async Task Household_SignUp_Is201WithLocationAndAnOpaqueId()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);

        var response = await coordinator.PostAsJsonAsync("/api/households", Household());
        await Expect(response, HttpStatusCode.Created);
        var id = (await response.Content.ReadFromJsonAsync<JsonObject>())!["id"]!.GetValue<string>();

        Assert.True(Guid.TryParse(id, out var guid) && guid != Guid.Empty, $"'{id}' is not a GUID.");
        Assert.False(long.TryParse(id, out _), "Household ids must not be counters.");
        Assert.Equal(4, guid.Version); // random, so the id says nothing about how many homes signed up
        Assert.Equal($"/api/households/{id}", response.Headers.Location?.OriginalString);
        await Expect(await coordinator.GetAsync(response.Headers.Location), HttpStatusCode.OK);

        var second = await SignUpAsync(coordinator);
        Assert.NotEqual(id, second);
        var audit = app.WithDb(db => db.AuditTrail.Single(a => a.SubjectKey == id));
        Assert.Equal(("household", "sign-up"), (audit.Subject, audit.Action));
    }

    [Fact]
    public async Task Household_Get_ReturnsEveryFieldAsSent()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        void Change(JsonObject h)
        {
            h["waterSource"] = "private-well";
            h["serviceLine"] = "galvanized";
            h["address"]!["line2"] = "Unit 2";
            h["yearBuilt"] = null;
            h["pregnant"] = true;
        }
        var sent = Household(Change);
        var id = await SignUpAsync(coordinator, Change);

        var read = await GetAsync(coordinator, $"/api/households/{id}");

        Assert.Equal(id, read["id"]!.GetValue<string>());
        foreach (var (field, value) in sent)
            Assert.True(JsonNode.DeepEquals(value, read[field]),
                $"{field}: sent {value?.ToJsonString() ?? "null"}, read {read[field]?.ToJsonString() ?? "null"}");
        Assert.Equal("private-well", read["waterSource"]!.GetValue<string>());
        Assert.Empty(read["kits"]!.AsArray());
    }

    [Fact]
    public async Task Household_Put_UpdatesAndAuditsFieldNamesWithoutValues()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var id = await SignUpAsync(coordinator);
        app.Clock.Now = app.Clock.Now.AddHours(2);

        var changed = Household(h =>
        {
            h["name"] = "Ottoline Brackwater";
            h["phone"] = "+1 555 0142";
            h["address"]!["city"] = "Marrowby";
            h["yearBuilt"] = 1962;
        });
        var response = await coordinator.PutAsJsonAsync($"/api/households/{id}", changed);
        await Expect(response, HttpStatusCode.NoContent);

        var read = await GetAsync(coordinator, $"/api/households/{id}");
        Assert.Equal("Ottoline Brackwater", read["name"]!.GetValue<string>());
        Assert.Equal("+1 555 0142", read["phone"]!.GetValue<string>());
        Assert.Equal("Marrowby", read["address"]!["city"]!.GetValue<string>());
        Assert.Equal(1962, read["yearBuilt"]!.GetValue<int>());
        Assert.Equal("2026-04-10T14:00:00Z", read["updatedAt"]!.GetValue<string>());

        var update = app.WithDb(db => db.AuditTrail.Single(a => a.SubjectKey == id && a.Action == "update"));
        Assert.Equal("household", update.Subject);
        Assert.Equal("coordinator", update.ActorRole);
        foreach (var field in new[] { "name", "phone", "address.city", "yearBuilt" }) Assert.Contains(field, update.Detail);
        Assert.DoesNotContain("email", update.Detail);
        var trail = app.WithDb(db => string.Join("\n", db.AuditTrail.Select(a => $"{a.SubjectKey} {a.Reason} {a.Detail}")));
        foreach (var value in new[] { "Ottoline", "Brackwater", "0142", "Marrowby", "1962", "Marisol", "Fennick", "1948" })
            Assert.DoesNotContain(value, trail);
    }

    [Fact]
    public async Task Household_PutWithNothingChanged_Is204AndWritesNoAudit()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var id = await SignUpAsync(coordinator);
        var before = Rows.Count(app);

        await Expect(await coordinator.PutAsJsonAsync($"/api/households/{id}", Household()), HttpStatusCode.NoContent);

        Assert.Equal(before, Rows.Count(app));
    }

    [Fact]
    public async Task Household_UnknownId_Is404Problem()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        await SignUpAsync(coordinator);
        var unknown = Guid.NewGuid();

        var problem = await ExpectProblem(await coordinator.GetAsync($"/api/households/{unknown}"), HttpStatusCode.NotFound);
        Assert.Contains(unknown.ToString(), problem["detail"]!.GetValue<string>());

        var before = Rows.Count(app);
        await ExpectProblem(await coordinator.PutAsJsonAsync($"/api/households/{unknown}", Household()), HttpStatusCode.NotFound);
        Assert.Equal(before, Rows.Count(app));
    }
}
