using System.Net;
using System.Text.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Households;
using CommunityLead.Tests.Data;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Households;

/// <summary>
/// Each text field against its column: one character more is refused by name, with the limit, before anything
/// is written; at the limit it is stored whole (PostgreSQL would refuse a longer value with a 500).
/// </summary>
public class HouseholdLengthTests
{
    /// <summary>(field as the client spells it, the column it is stored in)</summary>
    public static readonly TheoryData<string, string> Fields = new()
    {
        { "name", "Household.Name" },
        { "address.line1", "Household.Address.Line1" },
        { "address.line2", "Household.Address.Line2" },
        { "address.city", "Household.Address.City" },
        { "address.region", "Household.Address.Region" },
        { "address.postalCode", "Household.Address.PostalCode" },
        { "phone", "Household.Phone" },
        { "email", "Household.Email" },
        { "consentVersion", "Household.ConsentVersion" },
        { "areaCode", "Household.AreaCode" },
    };

    /// <summary>A value of the field's own shape, so only its length can be wrong.</summary>
    private static string Filled(string field, int length) => field switch
    {
        "email" => new string('m', length - "@example.org".Length) + "@example.org",
        "phone" => "+1 " + new string('5', length - 3),
        "areaCode" => new string('n', length),
        _ => new string('x', length),
    };

    [Theory]
    [MemberData(nameof(Fields))]
    public async Task Household_SignUpOneCharacterOverAColumn_Is400SayingTheLimitAndWritesNothing(string field, string column)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var limit = StoreModel.MaxLength(column);
        var before = Rows.Count(app);

        var body = With(Household(), field, JsonSerializer.Serialize(Filled(field, limit + 1)));
        var problem = await ExpectFieldError(await SendJson(coordinator, HttpMethod.Post, "/api/households", body), field);

        Assert.Contains(problem["errors"]![field]!.AsArray(), m => m!.GetValue<string>().Contains($"{limit}", StringComparison.Ordinal));
        Assert.Equal(before, Rows.Count(app));
    }

    [Theory]
    [MemberData(nameof(Fields))]
    public async Task Household_UpdateOneCharacterOverAColumn_Is400AndLeavesTheHouseholdAsItWas(string field, string column)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var id = await SignUpAsync(coordinator);
        var stored = await GetAsync(coordinator, $"/api/households/{id}");
        var before = Rows.Count(app);

        var body = With(Household(), field, JsonSerializer.Serialize(Filled(field, StoreModel.MaxLength(column) + 1)));
        await ExpectFieldError(await SendJson(coordinator, HttpMethod.Put, $"/api/households/{id}", body), field);

        Assert.Equal(before, Rows.Count(app));
        Assert.True(JsonNode.DeepEquals(stored, await GetAsync(coordinator, $"/api/households/{id}")));
    }

    [Fact]
    public async Task Household_EveryFieldAtItsColumnLength_IsStoredWhole()
    {
        // The longest area code is one the program has on its list.
        using var app = new CommunityLeadFactory { Areas = ["riverside", new string('n', StoreModel.MaxLength("Household.AreaCode"))] };
        var coordinator = app.CreateClient(Roles.Coordinator);
        var body = Household();
        foreach (var row in Fields)
        {
            var (field, column) = ((string)row[0], (string)row[1]);
            // A phone number's own pattern ends before its column does (26 of 40 characters).
            var length = field == "phone" ? 26 : StoreModel.MaxLength(column);
            With(body, field, JsonSerializer.Serialize(Filled(field, length)));
        }

        var id = (await PostAsync(coordinator, "/api/households", body, HttpStatusCode.Created))["id"]!.GetValue<string>();

        var stored = await GetAsync(coordinator, $"/api/households/{id}");
        Assert.Equal(body["name"]!.GetValue<string>(), stored["name"]!.GetValue<string>());
        Assert.Equal(body["address"]!["line2"]!.GetValue<string>(), stored["address"]!["line2"]!.GetValue<string>());
        Assert.Equal(body["email"]!.GetValue<string>(), stored["email"]!.GetValue<string>());
        Assert.Equal(body["areaCode"]!.GetValue<string>(), stored["areaCode"]!.GetValue<string>());
    }

    [Fact]
    public void Household_EveryFieldChanged_AuditDetailFitsItsColumn()
    {
        // The update's audit detail lists the changed fields' names (never their values): at worst all of them.
        var household = HouseholdMapping.NewHousehold(Request(Household()), DateTime.UtcNow);
        var other = Household(h =>
        {
            (h["name"], h["phone"], h["email"], h["language"], h["consentVersion"]) = ("B", "+1 555 0199", "b@example.org", "en", "2026-02");
            (h["consentGivenAt"], h["areaCode"], h["waterSource"], h["yearBuilt"]) = ("2026-03-03T10:00:00Z", "north", "private-well", 1990);
            (h["serviceLine"], h["childUnder6"], h["pregnant"], h["filterInUse"]) = ("copper", false, true, true);
            h["address"] = new JsonObject { ["line1"] = "1 B St", ["line2"] = "Apt 2", ["city"] = "C", ["region"] = "D", ["postalCode"] = "9" };
        });

        var changed = household.Apply(Request(other));

        Assert.Equal(18, changed.Count);
        Assert.True($"changed: {string.Join(", ", changed)}".Length <= StoreModel.MaxLength("AuditEntry.Detail"));
    }

    private static HouseholdRequest Request(JsonObject body)
    {
        var options = new JsonSerializerOptions(JsonSerializerDefaults.Web);
        CommunityLead.Api.Infrastructure.JsonSetup.Configure(options);
        return body.Deserialize<HouseholdRequest>(options)!;
    }
}
