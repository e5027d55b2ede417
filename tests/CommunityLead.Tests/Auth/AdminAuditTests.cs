using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Auth;

public class AdminAuditTests
{
    [Fact]
    public async Task AdminAudit_HouseholdIdsAndFreeTextReasons_Withheld()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var household = await SignUpAsync(coordinator);
        var code = await IssueKitAsync(coordinator, household);
        await PostAsync(coordinator, $"/api/kits/{code}/cancel", new { reason = "Marisol Quennell moved to her sister's" }, System.Net.HttpStatusCode.OK);

        var text = await app.CreateClient(Roles.Admin).GetStringAsync("/api/admin/audit?pageSize=100");
        Assert.DoesNotContain(household, text, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("Quennell", text);
        Assert.Contains("cancel", text);
    }
}
