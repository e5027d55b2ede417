using System.Net;
using CommunityLead.Api.Auth;
using static CommunityLead.Tests.Infrastructure.BadInput;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// An optional query value that does not convert is refused naming it, whichever type it has (ASP.NET Core's request
/// delegate generator, which compiles the endpoints for start-up, answers these with a bare 400 of its own:
/// UnconvertedQueryValues names them).
/// </summary>
public class QueryValueBindingTests
{
    [Fact]
    public async Task OptionalQueryValues_ThatDoNotConvert_Are400NamingTheValue()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var problem = await ExpectFieldError(await coordinator.PostAsync("/api/letters/batch?combined=maybe", null), "combined");
        Assert.Contains("'maybe'", problem["errors"]!["combined"]![0]!.GetValue<string>());
        await ExpectFieldError(await coordinator.GetAsync("/api/kits?pageSize=ten"), "pageSize");
        await ExpectFieldError(await coordinator.GetAsync("/api/kits?householdId=not-an-id"), "householdId");
        await ExpectFieldError(await app.CreateClient(Roles.Admin).GetAsync("/api/admin/audit?after=yesterday"), "after");
        // A value that converts is not the problem: the one that does not is named, not the first of the query.
        var both = await ExpectFieldError(await coordinator.GetAsync("/api/kits?page=2&pageSize=x"), "pageSize");
        Assert.False(both["errors"]!.AsObject().ContainsKey("page"));
        // Nothing was wrong with the query: the request goes through as before.
        Assert.Equal(HttpStatusCode.OK, (await coordinator.GetAsync("/api/kits?page=1&pageSize=10")).StatusCode);
    }
}
