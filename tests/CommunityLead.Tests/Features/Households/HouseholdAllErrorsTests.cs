using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Households;

/// <summary>A form with many mistakes is answered once, naming every one; invisible characters are dropped.</summary>
public class HouseholdAllErrorsTests
{
    private static JsonObject ManyMistakes() => Household(h =>
    {
        h["name"] = "";                                   // validator: required
        h["language"] = "fr";                             // not an enum value
        h["consentGivenAt"] = "2026-03-02T10:00:00";      // no UTC offset
        h["waterSource"] = "tap";                         // not an enum value
        h["yearBuilt"] = "old";                           // wrong JSON type
        h["childUnder6"] = "yes";                         // wrong JSON type
        h["areaCode"] = "harbor";                         // not on the area list
        h["address"]!["city"] = 12;                       // wrong type inside the address
        h["address"]!["postalCode"] = "";                 // validator, inside the address
    });

    private static readonly string[] Named =
        ["name", "language", "consentGivenAt", "waterSource", "yearBuilt", "childUnder6", "areaCode", "address.city", "address.postalCode"];

    [Fact]
    public async Task SignUp_ManyWrongFieldsOfEveryKind_OneProblemNamingEachAndNothingWritten()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);

        var response = await coordinator.PostAsJsonAsync("/api/households", ManyMistakes());

        await Expect(response, HttpStatusCode.BadRequest);
        var errors = (await response.Content.ReadFromJsonAsync<JsonObject>())!["errors"]!.AsObject();
        Assert.Equal(Named.Order(), errors.Select(e => e.Key).Order());
        Assert.Contains("en, es", errors["language"]![0]!.GetValue<string>());
        Assert.Contains("public, private-well", errors["waterSource"]![0]!.GetValue<string>());
        Assert.Contains("offset", errors["consentGivenAt"]![0]!.GetValue<string>(), StringComparison.OrdinalIgnoreCase);
        Assert.Single(errors["language"]!.AsArray());
        Assert.Equal(0, app.WithDb(db => db.Households.Count()));
    }

    [Fact]
    public async Task Update_ManyWrongFields_OneProblemNamingEachAndTheHouseholdUnchanged()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var id = await SignUpAsync(coordinator);
        var before = (await GetAsync(coordinator, $"/api/households/{id}")).ToJsonString();

        var response = await coordinator.PutAsJsonAsync($"/api/households/{id}", ManyMistakes());

        await Expect(response, HttpStatusCode.BadRequest);
        var errors = (await response.Content.ReadFromJsonAsync<JsonObject>())!["errors"]!.AsObject();
        Assert.Equal(Named.Order(), errors.Select(e => e.Key).Order());
        Assert.Equal(before, (await GetAsync(coordinator, $"/api/households/{id}")).ToJsonString());
    }

    [Fact]
    public async Task SignUp_ByteOrderMarkAndZeroWidthCharactersInTexts_StoredWithoutThemAndFoundBySearch()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        // U+FEFF (a byte order mark pasted from a file), U+200B zero-width space, U+200E left-to-right mark.
        var id = await SignUpAsync(coordinator, h =>
        {
            h["name"] = "\uFEFFMarisol Qu\u200Bennell";
            h["address"]!["line1"] = "14 Larkspur\u200E Row";
        });

        var stored = await GetAsync(coordinator, $"/api/households/{id}");

        Assert.Equal("Marisol Quennell", stored["name"]!.GetValue<string>());
        Assert.Equal("14 Larkspur Row", stored["address"]!["line1"]!.GetValue<string>());
        var found = await GetAsync(coordinator, "/api/households?search=Quennell");
        Assert.Contains(id, found.ToJsonString());
    }
}
