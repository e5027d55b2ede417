using System.Net;
using System.Net.Http.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using static CommunityLead.Tests.Infrastructure.BadInput;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Auth;

/// <summary>What happens to a request whose key is missing, unknown, revoked or sent the wrong way.</summary>
public class AuthenticationTests
{
    [Fact]
    public async Task Auth_RevokedKey_Is401()
    {
        using var app = new CommunityLeadFactory();
        var key = app.CreateKey(Roles.Coordinator, "front-desk");
        var client = ClientWith(app, $"Bearer {key}");
        await Expect(await client.GetAsync("/api/kits"), HttpStatusCode.OK);

        using (var scope = app.Services.CreateScope())
            await scope.ServiceProvider.GetRequiredService<ApiKeyService>().RevokeAsync("front-desk");

        await ExpectProblem(await client.GetAsync("/api/kits"), HttpStatusCode.Unauthorized);
    }

    [Theory]
    [InlineData("Bearer clk_0123456789abcdef_00112233445566778899aabbccddeeff00112233445566778899aabbccddeeff")]
    [InlineData("Bearer not-a-key")]
    [InlineData("Bearer ")]
    public async Task Auth_UnknownKey_Is401(string header)
    {
        using var app = new CommunityLeadFactory();
        await ExpectProblem(await ClientWith(app, header).GetAsync("/api/kits"), HttpStatusCode.Unauthorized);
    }

    [Theory]
    [InlineData("Basic xyz")]
    [InlineData("Token {key}")]
    [InlineData("{key}")]
    [InlineData("Bearer{key}")]
    public async Task Auth_MalformedAuthorizationHeader_Is401EvenWithARealKey(string header)
    {
        using var app = new CommunityLeadFactory();
        var key = app.CreateKey(Roles.Coordinator);
        await ExpectProblem(await ClientWith(app, header.Replace("{key}", key)).GetAsync("/api/kits"), HttpStatusCode.Unauthorized);
    }

    [Fact]
    public async Task Auth_NoKey_Is401ProblemWithBearerChallenge()
    {
        using var app = new CommunityLeadFactory();
        var response = await app.CreateClient().PostAsJsonAsync("/api/households", Household());
        var problem = await ExpectProblem(response, HttpStatusCode.Unauthorized);
        Assert.Equal(401, problem["status"]!.GetValue<int>());
        Assert.Contains(response.Headers.WwwAuthenticate, h => h.Scheme == "Bearer");
        Assert.Equal(0, app.WithDb(db => db.Households.Count()));
    }

    [Fact]
    public async Task Auth_WrongRole_Is403ProblemNamingTheRole()
    {
        using var app = new CommunityLeadFactory();
        var response = await app.CreateClient(Roles.Lab).PostAsJsonAsync("/api/households", Household());
        var problem = await ExpectProblem(response, HttpStatusCode.Forbidden);
        Assert.Equal(403, problem["status"]!.GetValue<int>());
        Assert.Contains("'lab'", problem["detail"]!.GetValue<string>());
        Assert.Equal(0, app.WithDb(db => db.Households.Count()));
    }

    [Fact]
    public async Task Auth_Health_IsOpenWithoutAKeyAndWithABadOne()
    {
        using var app = new CommunityLeadFactory();
        await Expect(await app.CreateClient().GetAsync("/health"), HttpStatusCode.OK);
        await Expect(await ClientWith(app, "Basic xyz").GetAsync("/health"), HttpStatusCode.OK);
    }

    public static HttpClient ClientWith(CommunityLeadFactory app, string authorization)
    {
        var client = app.CreateClient();
        Assert.True(client.DefaultRequestHeaders.TryAddWithoutValidation("Authorization", authorization));
        return client;
    }
}
