using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Data;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Areas;

/// <summary>Areas are a list the coordinator keeps; a household names one of its active areas or is refused.</summary>
public class AreaTests
{
    [Fact]
    public async Task Household_UnknownArea_400NamingAreaCodeAndListingTheKnownOnes()
    {
        using var app = new CommunityLeadFactory { Areas = ["harbour", "old-mill"] };
        var coordinator = app.CreateClient(Roles.Coordinator);

        var problem = await BadInput.ExpectFieldError(
            await coordinator.PostAsJsonAsync("/api/households", Household(h => h["areaCode"] = "harbor")), "areaCode");

        Assert.Contains("harbour, old-mill", problem["errors"]!["areaCode"]![0]!.GetValue<string>());
        Assert.Equal(0, app.WithDb(db => db.Households.Count()));
    }

    [Fact]
    public async Task Household_BeforeTheProgramListsAnyArea_AnyWellFormedCodeIsTaken()
    {
        using var app = new CommunityLeadFactory { Areas = [] };
        var coordinator = app.CreateClient(Roles.Coordinator);

        var response = await coordinator.PostAsJsonAsync("/api/households", Household(h => h["areaCode"] = "harbor"));

        Assert.Equal(HttpStatusCode.Created, response.StatusCode);
        await BadInput.ExpectFieldError(
            await coordinator.PostAsJsonAsync("/api/households", Household(h => h["areaCode"] = "not an area!")), "areaCode");
    }

    [Fact]
    public async Task Areas_AddRenameDeactivate_NewHomesCannotChooseItButItsHomesKeepIt()
    {
        using var app = new CommunityLeadFactory { Areas = [] };
        var coordinator = app.CreateClient(Roles.Coordinator);
        var admin = app.CreateClient(Roles.Admin);
        var health = app.CreateClient(Roles.Health);

        await PostAsync(coordinator, "/api/areas", new { code = " Salt-Marsh ", name = "Salt Marsh" }, HttpStatusCode.Created);
        await PostAsync(admin, "/api/areas", new { code = "riverside", name = "Riverside" }, HttpStatusCode.Created);
        await PostAsync(coordinator, "/api/areas", new { code = "salt-marsh", name = "Again" }, HttpStatusCode.Conflict);
        var home = await SignUpAsync(coordinator, h => h["areaCode"] = "salt-marsh");

        var renamed = await Send(coordinator, HttpMethod.Put, "/api/areas/salt-marsh", new { name = "Salt Marsh East", active = false }, HttpStatusCode.OK);
        Assert.Equal(("Salt Marsh East", false), (renamed["name"]!.GetValue<string>(), renamed["active"]!.GetValue<bool>()));
        var refused = await BadInput.ExpectFieldError(
            await coordinator.PostAsJsonAsync("/api/households", Household(h => h["areaCode"] = "salt-marsh")), "areaCode");
        Assert.Contains("riverside", refused["errors"]!["areaCode"]![0]!.GetValue<string>());
        Assert.DoesNotContain("salt-marsh,", refused["errors"]!["areaCode"]![0]!.GetValue<string>());
        // The home signed up before keeps its area through an edit.
        await Send(coordinator, HttpMethod.Put, $"/api/households/{home}", Household(h => { h["areaCode"] = "salt-marsh"; h["pregnant"] = true; }),
            HttpStatusCode.NoContent);
        await Send(coordinator, HttpMethod.Put, "/api/areas/nowhere", new { active = true }, HttpStatusCode.NotFound);

        var list = (await GetArrayAsync(health, "/api/areas")).Select(a => (a!["code"]!.GetValue<string>(), a["active"]!.GetValue<bool>()));
        Assert.Equal([("riverside", true), ("salt-marsh", false)], list);
        Assert.Equal(HttpStatusCode.Forbidden, (await app.CreateClient(Roles.Lab).GetAsync("/api/areas")).StatusCode);
        Assert.Equal(HttpStatusCode.Forbidden, (await health.PostAsJsonAsync("/api/areas", new { code = "x", name = "X" })).StatusCode);
    }

    [Theory]
    [InlineData("code", 40)]
    [InlineData("name", 100)]
    public async Task Area_TextOneCharacterOverItsColumn_400NamingItAndNothingAdded(string field, int limit)
    {
        Assert.Equal(limit, StoreModel.MaxLength(field == "code" ? "Area.Code" : "Area.Name"));
        using var app = new CommunityLeadFactory { Areas = [] };
        var coordinator = app.CreateClient(Roles.Coordinator);
        var body = new JsonObject { ["code"] = "salt-marsh", ["name"] = "Salt Marsh" };
        body[field] = new string('s', limit + 1);

        await BadInput.ExpectFieldError(await coordinator.PostAsJsonAsync("/api/areas", body), field);
        Assert.Equal(0, app.WithDb(db => db.Areas.Count()));

        body[field] = new string('s', limit);
        await PostAsync(coordinator, "/api/areas", body, HttpStatusCode.Created);
        Assert.Equal(limit, app.WithDb(db => field == "code" ? db.Areas.Single().Code.Length : db.Areas.Single().Name.Length));
    }

    private static async Task<JsonObject> Send(HttpClient client, HttpMethod method, string path, object body, HttpStatusCode expected)
    {
        var response = await client.SendAsync(new HttpRequestMessage(method, path) { Content = JsonContent.Create(body) });
        await Expect(response, expected);
        var text = await response.Content.ReadAsStringAsync();
        return text.Length == 0 ? [] : JsonNode.Parse(text)!.AsObject();
    }

    private static async Task<JsonArray> GetArrayAsync(HttpClient client, string path)
    {
        var response = await client.GetAsync(path);
        await Expect(response, HttpStatusCode.OK);
        return JsonNode.Parse(await response.Content.ReadAsStringAsync())!.AsArray();
    }
}
