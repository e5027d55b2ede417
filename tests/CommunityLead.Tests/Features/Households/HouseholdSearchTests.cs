using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Households;

public class HouseholdSearchTests
{
    [Fact]
    public async Task Search_ByPartOfNamePhoneOrStreet_FindsOnlyMatchingHomes()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var marisol = await SignUpAsync(coordinator);
        await SignUpAsync(coordinator, h => { h["name"] = "Tobias Wren"; h["phone"] = "+1 555 0999"; h["address"]!["line1"] = "3 Gull Street"; });
        await IssueKitAsync(coordinator, marisol);

        var byName = await GetAsync(coordinator, "/api/households?search=quenn");
        Assert.Equal(1, byName["total"]!.GetValue<int>());
        Assert.Equal(marisol, byName["items"]![0]!["id"]!.GetValue<string>());
        Assert.Equal(1, byName["items"]![0]!["kits"]!.GetValue<int>());
        Assert.Equal("Tobias Wren", (await GetAsync(coordinator, "/api/households?search=0999"))["items"]![0]!["name"]!.GetValue<string>());
        Assert.Equal("Tobias Wren", (await GetAsync(coordinator, "/api/households?search=gull"))["items"]![0]!["name"]!.GetValue<string>());
        Assert.Equal(0, (await GetAsync(coordinator, "/api/households?search=%25"))["total"]!.GetValue<int>()); // "%" is literal
        Assert.Equal(2, (await GetAsync(coordinator, "/api/households"))["total"]!.GetValue<int>());
        await GetAsync(coordinator, "/api/households?pageSize=500", HttpStatusCode.BadRequest);
    }

    [Theory]
    [InlineData("Ángela")]
    [InlineData("Núñez")]
    [InlineData("Peñón")]
    [InlineData("NGELA")] // case ignored for A–Z on both stores; SQLite's lower() leaves "Á" as it is
    public async Task Search_AccentedNameAsWritten_FoundOnEitherStore(string term)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        await SignUpAsync(coordinator, h => { h["name"] = "Ángela Núñez"; h["address"]!["line1"] = "9 Calle Peñón"; });
        await SignUpAsync(coordinator, h => h["name"] = "Angus Nye");

        var found = await GetAsync(coordinator, $"/api/households?search={Uri.EscapeDataString(term)}");

        Assert.Equal(1, found["total"]!.GetValue<int>());
        Assert.Equal("Ángela Núñez", found["items"]![0]!["name"]!.GetValue<string>());
    }

    [Theory]
    [InlineData("5550102234")]
    [InlineData("555-010-2234")]
    [InlineData("(555) 010 2234")]
    [InlineData("0102234")]
    public async Task Search_PhoneAsReadOutOnACall_FoundWhateverItsFormatting(string typed)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        await SignUpAsync(coordinator, h => { h["name"] = "Odile Marsh"; h["phone"] = "+1 (555) 010-2234"; });
        await SignUpAsync(coordinator, h => { h["name"] = "Pim Rooker"; h["phone"] = "+1 555 0199"; });

        var found = await GetAsync(coordinator, $"/api/households?search={Uri.EscapeDataString(typed)}");

        Assert.Equal(1, found["total"]!.GetValue<int>());
        Assert.Equal("Odile Marsh", found["items"]![0]!["name"]!.GetValue<string>());
        Assert.Equal("+1 (555) 010-2234", found["items"]![0]!["phone"]!.GetValue<string>());
    }
}
