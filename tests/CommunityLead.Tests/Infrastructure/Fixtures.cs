using System.Net;
using System.Net.Http.Json;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>Request bodies and small walks through the API that many tests need.</summary>
public static class Fixtures
{
    public static JsonObject Household(Action<JsonObject>? change = null)
    {
        var body = JsonNode.Parse("""
            {"name":"Marisol Quennell","address":{"line1":"14 Larkspur Row","line2":null,"city":"Fennick Hollow","region":"FH","postalCode":"00014"},
             "phone":"+1 555 0114","email":"marisol@example.org","language":"es","consentVersion":"2026-01",
             "consentGivenAt":"2026-03-02T10:00:00-05:00","areaCode":"riverside","waterSource":"public","yearBuilt":1948,
             "serviceLine":"lead","childUnder6":true,"pregnant":false,"filterInUse":false}
            """)!.AsObject();
        change?.Invoke(body);
        return body;
    }

    public static async Task<string> SignUpAsync(HttpClient coordinator, Action<JsonObject>? change = null)
    {
        var response = await coordinator.PostAsJsonAsync("/api/households", Household(change));
        await Expect(response, HttpStatusCode.Created);
        return (await response.Content.ReadFromJsonAsync<JsonObject>())!["id"]!.GetValue<string>();
    }

    public const string KitsHandedOut = "2026-03-01T09:00:00+00:00";

    public static async Task<string> IssueKitAsync(HttpClient coordinator, string? householdId = null, string kind = "water")
    {
        householdId ??= await SignUpAsync(coordinator);
        // Handed out on 1 March: before every collection and receipt date the tests write (the clock reads 10 April).
        var response = await coordinator.PostAsJsonAsync("/api/kits", new { householdId, kind, issuedAt = KitsHandedOut });
        await Expect(response, HttpStatusCode.Created);
        return (await response.Content.ReadFromJsonAsync<JsonObject>())!["code"]!.GetValue<string>();
    }

    /// <summary>A proper first draw (8 h standing) and a flushed bottle, on the morning of 2026-04-03 UTC.</summary>
    public static object GoodWaterCollection() => new
    {
        samples = new object[]
        {
            new { bottle = "first-draw", volumeMl = 1000, collectedAt = "2026-04-03T06:00:00+00:00", waterLastUsedAt = "2026-04-02T22:00:00+00:00", tap = "kitchen" },
            new { bottle = "flushed", volumeMl = 1000, collectedAt = "2026-04-03T06:05:00+00:00", flushSeconds = 120 },
        },
    };

    public static async Task<JsonObject> PostAsync(HttpClient client, string path, object? body, HttpStatusCode expected)
    {
        var response = await client.PostAsJsonAsync(path, body);
        await Expect(response, expected);
        var text = await response.Content.ReadAsStringAsync();
        return text.Length == 0 ? [] : JsonNode.Parse(text)!.AsObject();
    }

    public static async Task<JsonObject> GetAsync(HttpClient client, string path, HttpStatusCode expected = HttpStatusCode.OK)
    {
        var response = await client.GetAsync(path);
        await Expect(response, expected);
        return JsonNode.Parse(await response.Content.ReadAsStringAsync())!.AsObject();
    }

    public static async Task Expect(HttpResponseMessage response, HttpStatusCode expected)
    {
        if (response.StatusCode != expected)
            Assert.Fail($"{response.RequestMessage?.Method} {response.RequestMessage?.RequestUri?.PathAndQuery}: " +
                        $"expected {(int)expected}, got {(int)response.StatusCode}: {await response.Content.ReadAsStringAsync()}");
    }

    public static readonly JsonSerializerOptions Json = new(JsonSerializerDefaults.Web);
}
