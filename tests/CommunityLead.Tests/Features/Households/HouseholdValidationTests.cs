using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Households;

/// <summary>A household body that is wrong in one place is refused with that place named, and nothing is written.</summary>
public class HouseholdValidationTests
{
    private static readonly string TooLong201 = $"\"{new string('x', 201)}\"";

    /// <summary>(path to change, new value as JSON or null to leave it out, field the 400 must name)</summary>
    public static readonly TheoryData<string, string?, string> BadFields = new()
    {
        // Missing
        { "name", null, "name" },
        { "name", "\"   \"", "name" },
        { "address", null, "address" },
        { "address.line1", null, "address.line1" },
        { "address.postalCode", "\"\"", "address.postalCode" },
        { "language", null, "language" },
        { "consentGivenAt", null, "consentGivenAt" },
        { "waterSource", null, "waterSource" },
        { "childUnder6", null, "childUnder6" },
        { "childUnder6", "null", "childUnder6" },
        // Wrong JSON type
        { "yearBuilt", "\"old\"", "yearBuilt" },
        { "childUnder6", "\"yes\"", "childUnder6" },
        { "address", "\"14 Larkspur Row\"", "address" },
        // Values outside the contract's enums (integers included: enums are strings)
        { "waterSource", "\"river\"", "waterSource" },
        { "waterSource", "1", "waterSource" },
        { "serviceLine", "\"asbestos\"", "serviceLine" },
        { "language", "\"fr\"", "language" },
        // Too long
        { "name", TooLong201, "name" },
        { "address.line1", TooLong201, "address.line1" },
        // Shapes
        { "email", "\"marisol.example.org\"", "email" },
        { "email", "\"marisol@@example\"", "email" },
        { "phone", "\"call me\"", "phone" },
        { "phone", "\"12\"", "phone" },
        { "areaCode", "\"north 3!\"", "areaCode" },
        // Dates and years
        { "yearBuilt", "2027", "yearBuilt" },
        { "yearBuilt", "1699", "yearBuilt" },
        { "consentGivenAt", "\"2026-05-01T10:00:00-05:00\"", "consentGivenAt" },
        { "consentGivenAt", "\"1999-12-31T10:00:00-05:00\"", "consentGivenAt" },
        { "consentGivenAt", "\"2026-03-02T10:00:00\"", "consentGivenAt" },
        { "consentGivenAt", "\"2026-03-02\"", "consentGivenAt" },
        // Fields the contract doesn't have
        { "colour", "\"blue\"", "colour" },
        { "address.colour", "\"blue\"", "address.colour" },
    };

    [Theory]
    [MemberData(nameof(BadFields))]
    public async Task Household_SignUpWithBadField_Is400NamingItAndWritesNothing(string path, string? json, string field)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var before = Rows.Count(app);

        await ExpectFieldError(await SendJson(coordinator, HttpMethod.Post, "/api/households", With(Household(), path, json)), field);

        Assert.Equal(before, Rows.Count(app));
    }

    [Theory]
    [InlineData("name", null, "name")]
    [InlineData("yearBuilt", "\"old\"", "yearBuilt")]
    [InlineData("consentGivenAt", "\"2026-03-02T10:00:00\"", "consentGivenAt")]
    [InlineData("email", "\"nobody\"", "email")]
    public async Task Household_UpdateWithBadField_Is400AndLeavesTheHouseholdAsItWas(string path, string? json, string field)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var id = await SignUpAsync(coordinator);
        var stored = await GetAsync(coordinator, $"/api/households/{id}");
        var before = Rows.Count(app);

        var bad = With(Household(h => h["name"] = "Someone Else"), path, json);
        await ExpectFieldError(await SendJson(coordinator, HttpMethod.Put, $"/api/households/{id}", bad), field);

        Assert.Equal(before, Rows.Count(app));
        Assert.True(JsonNode.DeepEquals(stored, await GetAsync(coordinator, $"/api/households/{id}")));
    }

    [Fact]
    public async Task Household_TimeWithoutOffset_SaysAnOffsetIsNeeded()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var body = Household(h => h["consentGivenAt"] = "2026-04-03T06:00:00");

        var problem = await ExpectFieldError(await SendJson(coordinator, HttpMethod.Post, "/api/households", body), "consentGivenAt");

        Assert.Contains("UTC offset", problem["errors"]!["consentGivenAt"]![0]!.GetValue<string>());
    }

    [Theory]
    [InlineData("waterSource", "\"river\"", "public, private-well")]
    [InlineData("serviceLine", "\"asbestos\"", "unknown, lead, galvanized, copper, plastic")]
    [InlineData("language", "\"fr\"", "en, es")]
    public async Task Household_UnknownEnumValue_ListsTheValuesTheContractAllows(string field, string json, string allowed)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);

        var problem = await ExpectFieldError(await SendJson(coordinator, HttpMethod.Post, "/api/households", With(Household(), field, json)), field);

        Assert.Equal($"Use one of: {allowed}.", problem["errors"]![field]![0]!.GetValue<string>());
    }

    [Theory]
    [InlineData("yearBuilt", "2026")]
    [InlineData("yearBuilt", "1700")]
    [InlineData("yearBuilt", "null")]
    [InlineData("phone", "null")]
    [InlineData("email", null)]
    [InlineData("consentGivenAt", "\"2026-04-10T12:00:00Z\"")]
    public async Task Household_EdgeOfValid_IsAccepted(string path, string? json)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var body = With(Household(h => h["name"] = new string('x', 200)), path, json);
        await Expect(await SendJson(coordinator, HttpMethod.Post, "/api/households", body), HttpStatusCode.Created);
    }

    [Theory]
    // A body cut short is read whole before its fields are (HouseholdRequest is read field by field), so the
    // answer names the body, not the field it broke off in.
    [InlineData("{\"name\":\"Marisol Quennell\",\"address\":{\"line1\":", "body")]
    [InlineData("{\"name\":\"Marisol Quennell\",", "body")]
    [InlineData("", "body")]
    [InlineData("[]", "body")]
    public async Task Household_UnreadableJson_Is400NamingWhereAndWritesNothing(string text, string field)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var before = Rows.Count(app);

        await ExpectFieldError(await SendRaw(coordinator, HttpMethod.Post, "/api/households", text, "application/json"), field);

        Assert.Equal(before, Rows.Count(app));
    }

    [Fact]
    public async Task Household_TextPlainBody_Is415ProblemAndWritesNothing()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var before = Rows.Count(app);

        await ExpectProblem(await SendRaw(coordinator, HttpMethod.Post, "/api/households", Household().ToJsonString(), "text/plain"),
            HttpStatusCode.UnsupportedMediaType);

        Assert.Equal(before, Rows.Count(app));
    }
}
