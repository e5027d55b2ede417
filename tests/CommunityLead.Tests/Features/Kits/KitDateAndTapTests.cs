using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Kits;

/// <summary>Dates before the kit was handed out are kept and flagged; the tap is one of a closed list, with a note.</summary>
public class KitDateAndTapTests
{
    private static async Task<string> KitIssuedOnAsync(HttpClient coordinator, string issuedAt)
    {
        var response = await coordinator.PostAsJsonAsync("/api/kits", new { householdId = await SignUpAsync(coordinator), kind = "water", issuedAt });
        await Expect(response, HttpStatusCode.Created);
        return (await response.Content.ReadFromJsonAsync<JsonObject>())!["code"]!.GetValue<string>();
    }

    [Fact]
    public async Task Collection_DatedBeforeTheKitWasIssued_KeptWithAFlagOnThatBottle()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await KitIssuedOnAsync(coordinator, "2026-04-03T06:02:00+00:00"); // between the two bottles

        var kit = await PostAsync(coordinator, $"/api/kits/{code}/collection", GoodWaterCollection(), HttpStatusCode.OK);

        var flags = kit["flags"]!.AsArray().Where(f => f!["code"]!.GetValue<string>() == "collected-before-issue").ToList();
        var flag = Assert.Single(flags)!;
        Assert.Equal("first-draw", flag["bottle"]!.GetValue<string>());
        Assert.Contains("2026-04-03 06:02 UTC", flag["message"]!.GetValue<string>());
        Assert.Equal("collected", kit["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task Receipt_DatedBeforeTheKitWasIssued_KeptAndSaidInTheKitsHistory()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var code = await KitIssuedOnAsync(coordinator, "2026-04-05T09:00:00+00:00");

        await PostAsync(lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);

        var kit = await GetAsync(coordinator, $"/api/kits/{code}");
        Assert.Equal("received", kit["state"]!.GetValue<string>());
        Assert.Contains(kit["history"]!.AsArray(), h => h!["detail"]?.GetValue<string>()?.Contains("before the kit was issued") == true);
    }

    [Fact]
    public async Task Issue_HandOutDateInTheFuture_400NamingIssuedAt()
    {
        using var app = new CommunityLeadFactory(); // clock: 2026-04-10T12:00Z
        var coordinator = app.CreateClient(Roles.Coordinator);
        var household = await SignUpAsync(coordinator);

        await BadInput.ExpectFieldError(
            await coordinator.PostAsJsonAsync("/api/kits", new { householdId = household, kind = "water", issuedAt = "2026-04-12T09:00:00+00:00" }), "issuedAt");
    }

    [Fact]
    public async Task Collection_TapOutsideTheList_400ListingTheTaps()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var body = BadInput.Json(GoodWaterCollection());
        body["samples"]![0]!["tap"] = "upstairs sink by Marisol's room";

        var problem = await BadInput.ExpectFieldError(await coordinator.PostAsJsonAsync($"/api/kits/{code}/collection", body), "samples[0].tap");

        Assert.Contains("kitchen, bathroom, laundry, other", problem["errors"]!["samples[0].tap"]![0]!.GetValue<string>());
        Assert.Equal(0, app.WithDb(db => db.Collections.Count()));
    }
}
