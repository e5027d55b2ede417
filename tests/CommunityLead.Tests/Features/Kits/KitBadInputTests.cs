using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Kits;

/// <summary>Bad kit requests are refused with the field or state named, and leave no row behind.</summary>
public class KitBadInputTests
{
    private const string At = "2026-04-03T06:00:00+00:00";

    public static readonly TheoryData<string, string?, string> BadIssues = new()
    {
        { "kind", "\"bottle\"", "kind" },
        { "kind", null, "kind" },
        { "householdId", null, "householdId" },
        { "householdId", "\"not-a-guid\"", "householdId" },
        { "householdId", "\"00000000-0000-0000-0000-000000000000\"", "householdId" },
        { "householdId", "\"7d5f1c0e-2b9a-4c1e-9f3a-5a8b6c4d2e10\"", "householdId" }, // well formed, but nobody signed up with it
        { "colour", "\"blue\"", "colour" },
    };

    [Theory]
    [MemberData(nameof(BadIssues))]
    public async Task Kit_IssueWithBadField_Is400NamingItAndWritesNothing(string path, string? json, string field)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var body = Json(new { householdId = await SignUpAsync(coordinator), kind = "water" });
        var before = Rows.Count(app);

        await ExpectFieldError(await SendJson(coordinator, HttpMethod.Post, "/api/kits", With(body, path, json)), field);

        Assert.Equal(before, Rows.Count(app));
    }

    /// <summary>(kit kind, path in the good water collection, new JSON or null to leave out, field the 400 must name)</summary>
    public static readonly TheoryData<string, string, string?, string> BadCollections = new()
    {
        { "water", "samples[0]", $$"""{"bottle":"soil","location":"yard","collectedAt":"{{At}}"}""", "samples[0].bottle" },
        { "soil", "samples[0]", $$"""{"bottle":"first-draw","volumeMl":1000,"collectedAt":"{{At}}"}""", "samples[0].bottle" },
        { "water", "samples[1].bottle", "\"third-draw\"", "samples[1].bottle" },
        { "water", "samples[0].tap", $"\"{new string('t', 61)}\"", "samples[0].tap" },
        { "water", "samples[0].collectedAt", "\"2026-04-03T06:00:00\"", "samples[0].collectedAt" },
        { "water", "samples[0].collectedAt", null, "samples[0].collectedAt" },
        { "water", "samples[0].collectedAt", "\"2031-01-01T00:00:00Z\"", "samples[0].collectedAt" },
        { "water", "samples[0].volumeMl", "\"a litre\"", "samples[0].volumeMl" },
        { "water", "samples[0].volumeMl", "9", "samples[0].volumeMl" },
        { "water", "samples[0].position", "1", "samples[0].position" },
        { "water", "samples[1].flushSeconds", "3601", "samples[1].flushSeconds" },
        { "water", "samples[0].colour", "\"blue\"", "samples[0].colour" },
        { "water", "samples", "[]", "samples" },
        { "water", "samples", null, "samples" },
        { "water-sequential", "samples[0]", $$"""{"bottle":"sequential","volumeMl":250,"collectedAt":"{{At}}"}""", "samples[0].position" },
        { "soil", "samples[0]", $$"""{"bottle":"soil","collectedAt":"{{At}}"}""", "samples[0].location" },
    };

    [Theory]
    [MemberData(nameof(BadCollections))]
    public async Task Kit_CollectionWithBadField_Is400NamingItAndWritesNothing(string kind, string path, string? json, string field)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator, kind: kind);
        var before = Rows.Count(app);

        var body = With(Json(GoodWaterCollection()), path, json);
        await ExpectFieldError(await SendJson(coordinator, HttpMethod.Post, $"/api/kits/{code}/collection", body), field);

        Assert.Equal(before, Rows.Count(app));
        Assert.Equal("issued", (await GetAsync(coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }

    [Theory]
    [InlineData("cancel", "{}", "reason")]
    [InlineData("cancel", """{"reason":""}""", "reason")]
    [InlineData("cancel", """{"reason":"no"}""", "reason")]
    [InlineData("lost", """{"reason":null}""", "reason")]
    [InlineData("cancel", "", "body")]
    [InlineData("cancel", """{"reason":"moved away""", "reason")]
    [InlineData("receipt", "{}", "receivedAt")]
    [InlineData("receipt", """{"receivedAt":"2026-04-04T11:00:00"}""", "receivedAt")]
    [InlineData("receipt", """{"receivedAt":"2026-04-11T12:00:00Z"}""", "receivedAt")]
    [InlineData("collection", """{"samples":[{"bottle":"first-draw","volumeMl":1000,"collectedAt":""", "samples[0].collectedAt")]
    public async Task Kit_MoveWithBadBody_Is400NamingItAndLeavesTheKitIssued(string move, string body, string field)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var before = Rows.Count(app);

        await ExpectFieldError(await SendRaw(coordinator, HttpMethod.Post, $"/api/kits/{code}/{move}", body, "application/json"), field);

        Assert.Equal(before, Rows.Count(app));
        Assert.Equal("issued", (await GetAsync(coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task Kit_CollectionAsTextPlain_Is415ProblemAndWritesNothing()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var before = Rows.Count(app);

        var text = Json(GoodWaterCollection()).ToJsonString();
        await ExpectProblem(await SendRaw(coordinator, HttpMethod.Post, $"/api/kits/{code}/collection", text, "text/plain"),
            HttpStatusCode.UnsupportedMediaType);

        Assert.Equal(before, Rows.Count(app));
    }

    public static readonly TheoryData<string, string?> CodeRoutes = new()
    {
        { "GET", "" }, { "POST", "/collection" }, { "POST", "/receipt" }, { "POST", "/cancel" }, { "POST", "/lost" },
        { "POST", "/reject" }, { "POST", "/replacement" }, { "POST", "/close" },
    };

    [Theory]
    [MemberData(nameof(CodeRoutes))]
    public async Task Kit_MistypedCheckCharacter_Is400SayingMistypedNever404(string method, string? route)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var mistyped = code[..^1] + KitCode.Alphabet[(KitCode.Alphabet.IndexOf(code[^1]) + 1) % KitCode.Alphabet.Length];
        var before = Rows.Count(app);

        var problem = await ExpectFieldError(await SendValid(coordinator, method, mistyped, route), "code");

        Assert.Contains("mistyped (check character)", problem["title"]!.GetValue<string>());
        Assert.Contains("mistyped (check character)", problem["errors"]!["code"]![0]!.GetValue<string>());
        Assert.Equal(before, Rows.Count(app));
    }

    [Theory]
    [MemberData(nameof(CodeRoutes))]
    public async Task Kit_WellFormedCodeNeverIssued_Is404Problem(string method, string? route)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        await IssueKitAsync(coordinator);
        var before = Rows.Count(app);

        await ExpectProblem(await SendValid(coordinator, method, KitCode.NewCode(), route), HttpStatusCode.NotFound);

        Assert.Equal(before, Rows.Count(app));
    }

    [Theory]
    [InlineData("issued", "close", "record-collection,receive,cancel,mark-lost,replace")]
    [InlineData("issued", "reject", "record-collection,receive,cancel,mark-lost,replace")]
    [InlineData("cancelled", "receipt", "replace")]
    [InlineData("cancelled", "collection", "replace")]
    [InlineData("cancelled", "cancel", "replace")]
    public async Task Kit_IllegalMove_Is409WithStateAndAllowedActionsAndChangesNothing(string state, string move, string allowed)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        if (state == "cancelled") await PostAsync(coordinator, $"/api/kits/{code}/cancel", new { reason = "household moved" }, HttpStatusCode.OK);
        var before = Rows.Count(app);

        var problem = await ExpectProblem(await SendValid(coordinator, "POST", code, $"/{move}"), HttpStatusCode.Conflict);

        Assert.Equal(state, problem["currentState"]!.GetValue<string>());
        Assert.Equal(allowed, string.Join(",", problem["allowedActions"]!.AsArray().Select(a => a!.GetValue<string>())));
        Assert.Equal(before, Rows.Count(app));
        Assert.Equal(state, (await GetAsync(coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task Kit_ReplacedTwice_Is409AndIssuesNoSecondKit()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);
        var replacement = await PostAsync(coordinator, $"/api/kits/{code}/replacement", new { reason = "label torn" }, HttpStatusCode.Created);
        var before = Rows.Count(app);

        var problem = await ExpectProblem(await SendValid(coordinator, "POST", code, "/replacement"), HttpStatusCode.Conflict);

        Assert.Equal(replacement["code"]!.GetValue<string>(), problem["replacedByCode"]!.GetValue<string>());
        Assert.Equal(before, Rows.Count(app));
    }

    [Fact]
    public async Task Kit_QueueWithBadQuery_Is400NamingTheParameter()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        await ExpectFieldError(await coordinator.GetAsync("/api/kits?state=misplaced"), "state");
        await ExpectFieldError(await coordinator.GetAsync("/api/kits?page=0"), "page");
        await ExpectFieldError(await coordinator.GetAsync("/api/kits?page=two"), "page");
        await ExpectFieldError(await coordinator.GetAsync("/api/kits?pageSize=500"), "pageSize");
    }

    /// <summary>A request that would succeed on the right kit in the right state: only the code or state is wrong.</summary>
    private static Task<HttpResponseMessage> SendValid(HttpClient client, string method, string code, string? route)
    {
        JsonNode? body = route switch
        {
            "/collection" => Json(GoodWaterCollection()),
            "/receipt" => Json(new { receivedAt = "2026-04-04T11:00:00+00:00" }),
            "/cancel" or "/lost" or "/reject" => Json(new { reason = "a good reason" }),
            "/replacement" => Json(new { reason = "label torn" }),
            _ => null,
        };
        return body is null
            ? client.SendAsync(new HttpRequestMessage(new HttpMethod(method), $"/api/kits/{code}{route}"))
            : SendJson(client, new HttpMethod(method), $"/api/kits/{code}{route}", body);
    }
}

public class WrongValueMessageTests
{
    [Theory]
    [InlineData("{\"householdId\":\"not-a-guid\",\"kind\":\"water\"}", "householdId", "like 3f2a9c1e")]
    [InlineData("{\"householdId\":\"3f2a9c1e-4b5d-4e6f-8a7b-9c0d1e2f3a4b\",\"kind\":7}", "kind", "Use one of")]
    public async Task IssueKit_ValueOfTheWrongForm_FieldProblemSaysWhatToSend(string body, string field, string advice)
    {
        using var app = new CommunityLead.Tests.Infrastructure.CommunityLeadFactory();
        var client = app.CreateClient(CommunityLead.Api.Auth.Roles.Coordinator);
        var response = await client.PostAsync("/api/kits", new StringContent(body, System.Text.Encoding.UTF8, "application/json"));
        Assert.Equal(System.Net.HttpStatusCode.BadRequest, response.StatusCode);
        var problem = System.Text.Json.Nodes.JsonNode.Parse(await response.Content.ReadAsStringAsync())!;
        Assert.Equal("The request has invalid fields.", problem["title"]!.GetValue<string>());
        Assert.Contains(advice, problem["errors"]![field]![0]!.GetValue<string>());
    }
}
