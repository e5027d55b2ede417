using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Auth;

/// <summary>Who may see a home: the coordinator. The lab sees kits without the home; the health department neither.</summary>
public class PrivacyTests
{
    private static readonly string[] PersonalValues =
        ["Ottoline", "Brackwater", "27 Quillon Terrace", "Flat 3", "Marrowby", "QZ-7781", "555 0199", "ottoline.b@example.org"];

    [Fact]
    public async Task KitView_Lab_HasNoHouseholdIdHistoryOrPersonalData()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var householdId = await SignUpAsync(coordinator, h =>
        {
            h["name"] = "Ottoline Brackwater";
            h["address"] = new System.Text.Json.Nodes.JsonObject
            {
                ["line1"] = "27 Quillon Terrace", ["line2"] = "Flat 3", ["city"] = "Marrowby", ["region"] = "MB", ["postalCode"] = "QZ-7781",
            };
            h["phone"] = "+1 555 0199";
            h["email"] = "ottoline.b@example.org";
        });
        var code = await IssueKitAsync(coordinator, householdId);
        await PostAsync(coordinator, $"/api/kits/{code}/collection", GoodWaterCollection(), HttpStatusCode.OK);
        await PostAsync(lab, $"/api/kits/{code}/receipt", new { receivedAt = "2026-04-04T11:00:00+00:00" }, HttpStatusCode.OK);
        // Free-text reasons are where a name slips in; the lab must not see them either.
        await PostAsync(coordinator, $"/api/kits/{code}/reject", new { reason = "Ottoline Brackwater says the cap was loose" }, HttpStatusCode.OK);

        var labResponse = await lab.GetAsync($"/api/kits/{code}");
        await Expect(labResponse, HttpStatusCode.OK);
        var labJson = await labResponse.Content.ReadAsStringAsync();
        Assert.Contains(code, labJson);
        Assert.DoesNotContain("householdId", labJson, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain(householdId, labJson, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("\"history\"", labJson, StringComparison.OrdinalIgnoreCase);
        foreach (var value in PersonalValues) Assert.DoesNotContain(value, labJson, StringComparison.OrdinalIgnoreCase);

        var coordinatorView = await GetAsync(coordinator, $"/api/kits/{code}");
        Assert.Equal(householdId, coordinatorView["householdId"]!.GetValue<string>());
        Assert.Equal(["issue", "record-collection", "receive", "reject"],
            coordinatorView["history"]!.AsArray().Select(h => h!["action"]!.GetValue<string>()));
    }

    /// <summary>
    /// The health department sees aggregate reports only, never one home. Checked against the app's real
    /// route table (not <see cref="RouteTable"/>), so a new household or kit route is covered the day it appears.
    /// </summary>
    [Fact]
    public async Task Privacy_HealthRole_IsForbiddenEveryHouseholdAndKitRoute()
    {
        using var app = new CommunityLeadFactory();
        var health = app.CreateClient(Roles.Health);
        var routes = RoleMatrixTests.AppRoutes(app)
            .Where(r => r.Pattern.StartsWith("/api/households", StringComparison.Ordinal) ||
                        r.Pattern.StartsWith("/api/kits", StringComparison.Ordinal))
            .ToList();
        Assert.True(routes.Count >= 13, $"Expected the household and kit routes, found {routes.Count}.");

        var leaks = new List<string>();
        foreach (var route in routes)
        {
            using var request = RouteTable.Send(new HttpMethod(route.Method), RoleMatrixTests.Fill(route.Pattern), new { });
            using var response = await health.SendAsync(request);
            if (response.StatusCode != HttpStatusCode.Forbidden) leaks.Add($"{route.Key}: {(int)response.StatusCode}");
        }
        Assert.True(leaks.Count == 0, $"The health role reached household or kit routes: {string.Join(", ", leaks)}");
    }
}
