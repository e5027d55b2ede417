using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Attention;

public class AttentionByKitTests
{
    [Fact]
    public async Task AttentionKits_KitWithSeveralReasons_OneRowWithNameAndPhoneMostUrgentFirst()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var setup = new RouteSetup(app, coordinator);
        var actionLevel = await setup.InterpretedKitAsync(firstDrawLead: 25);
        var urgent = await setup.InterpretedKitAsync(firstDrawLead: 120);

        var perReason = (await GetArrayAsync(coordinator, "/api/attention")).Select(e => e!["kitCode"]!.GetValue<string>()).ToList();
        var kits = await GetArrayAsync(coordinator, "/api/attention/kits");

        // The per-reason list names the urgent kit more than once; the grouped view names each kit once.
        Assert.True(perReason.Count(c => c == urgent) > 1, string.Join(", ", perReason));
        Assert.Equal([urgent, actionLevel], kits.Select(k => k!["kitCode"]!.GetValue<string>()));
        var first = kits[0]!;
        Assert.Equal("urgent", first["mostUrgent"]!.GetValue<string>());
        Assert.Equal("Marisol Quennell", first["householdName"]!.GetValue<string>());
        Assert.Equal("+1 555 0114", first["phone"]!.GetValue<string>());
        var reasons = first["reasons"]!.AsArray().Select(r => r!["reason"]!.GetValue<string>()).ToList();
        Assert.Equal(perReason.Count(c => c == urgent), reasons.Count);
        Assert.Equal("urgent", reasons[0]);

        // Resolving every reason of a kit takes it off the grouped view.
        foreach (var reason in first["reasons"]!.AsArray())
            await PostAsync(coordinator, $"/api/attention/{reason!["id"]!.GetValue<int>()}/resolve", new { note = "called; bottled water arranged" }, HttpStatusCode.NoContent);
        Assert.Equal([actionLevel], (await GetArrayAsync(coordinator, "/api/attention/kits")).Select(k => k!["kitCode"]!.GetValue<string>()));
    }

    private static async Task<JsonArray> GetArrayAsync(HttpClient client, string path)
    {
        var response = await client.GetAsync(path);
        await Expect(response, HttpStatusCode.OK);
        return JsonNode.Parse(await response.Content.ReadAsStringAsync())!.AsArray();
    }
}
