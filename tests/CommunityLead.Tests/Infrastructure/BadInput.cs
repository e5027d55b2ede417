using System.Net;
using System.Text;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using CommunityLead.Tests.Infrastructure;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// Helpers for "bad input is refused, named, and leaves no trace" tests. Shared with the kit tests; it
/// belongs in tests/Infrastructure once that folder is free to edit.
/// </summary>
public static partial class BadInput
{
    /// <summary>Rows a refused request must not have added to.</summary>
    public sealed record Rows(int Households, int Kits, int AuditEntries, int Collections)
    {
        public static Rows Count(CommunityLeadFactory app) => app.WithDb(db =>
            new Rows(db.Households.Count(), db.Kits.Count(), db.AuditTrail.Count(), db.Collections.Count()));
    }

    public static async Task<JsonObject> ExpectProblem(HttpResponseMessage response, HttpStatusCode expected)
    {
        await Fixtures.Expect(response, expected);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        var problem = JsonNode.Parse(await response.Content.ReadAsStringAsync())!.AsObject();
        Assert.Equal((int)expected, problem["status"]?.GetValue<int>());
        return problem;
    }

    /// <summary>A 400 problem whose <c>errors</c> has an entry for <paramref name="field"/>, spelt as the client spells it.</summary>
    public static async Task<JsonObject> ExpectFieldError(HttpResponseMessage response, string field)
    {
        var problem = await ExpectProblem(response, HttpStatusCode.BadRequest);
        var errors = problem["errors"] as JsonObject;
        Assert.True(errors is not null && errors.ContainsKey(field),
            $"Expected errors to name '{field}', got: {problem.ToJsonString()}");
        Assert.NotEmpty(errors[field]!.AsArray());
        return problem;
    }

    public static Task<HttpResponseMessage> SendJson(HttpClient client, HttpMethod method, string path, JsonNode body) =>
        SendRaw(client, method, path, body.ToJsonString(), "application/json");

    public static Task<HttpResponseMessage> SendRaw(HttpClient client, HttpMethod method, string path, string text, string contentType) =>
        client.SendAsync(new HttpRequestMessage(method, path) { Content = new StringContent(text, Encoding.UTF8, contentType) });

    /// <summary>
    /// Changes one field of a JSON body: <paramref name="path"/> like "address.postalCode" or "samples[0].tap";
    /// <paramref name="json"/> is the new value as JSON text, or null to remove the field.
    /// </summary>
    public static JsonObject With(JsonObject body, string path, string? json)
    {
        var steps = path.Split('.');
        JsonNode parent = body;
        foreach (var step in steps[..^1]) parent = Step(parent, step);
        var last = steps[^1];
        var value = json is null ? null : JsonNode.Parse(json);
        if (Index().Match(last) is { Success: true } m)
        {
            var array = parent[m.Groups[1].Value]!.AsArray();
            array[int.Parse(m.Groups[2].Value)] = value;
        }
        else if (json is null) parent.AsObject().Remove(last);
        else parent[last] = value;
        return body;
    }

    public static JsonObject Json(object value) => JsonNode.Parse(System.Text.Json.JsonSerializer.Serialize(value, Fixtures.Json))!.AsObject();

    private static JsonNode Step(JsonNode node, string step) =>
        Index().Match(step) is { Success: true } m
            ? node[m.Groups[1].Value]![int.Parse(m.Groups[2].Value)]!
            : node[step]!;

    [GeneratedRegex(@"^(\w+)\[(\d+)\]$")]
    private static partial Regex Index();
}
