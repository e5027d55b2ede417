using System.Net;
using System.Text.RegularExpressions;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Http;
using Microsoft.AspNetCore.Routing;
using Microsoft.Extensions.DependencyInjection;

namespace CommunityLead.Tests.Auth;

/// <summary>
/// Every route of the app, called without a key and with each role's key. The routes come from the app's
/// own route table, so a route added without an expectation in <see cref="RouteTable"/> fails the suite.
/// </summary>
public class RoleMatrixTests
{
    [Fact]
    public void RoleMatrix_RoutesOfTheApp_EqualTheRoutesWithExpectations()
    {
        using var app = new CommunityLeadFactory();
        var actual = AppRoutes(app).Select(r => r.Key).ToHashSet();
        var expected = RouteTable.Expectations.Keys.ToHashSet();

        var withoutExpectation = actual.Except(expected).Order().ToList();
        var gone = expected.Except(actual).Order().ToList();
        Assert.True(withoutExpectation.Count == 0 && gone.Count == 0,
            $"Routes without an expectation in RouteTable: [{string.Join(", ", withoutExpectation)}]; " +
            $"expectations for routes the app no longer has: [{string.Join(", ", gone)}].");
    }

    [Fact]
    public async Task RoleMatrix_EveryRouteAndCaller_GetsTheDesignedStatus()
    {
        using var app = new CommunityLeadFactory();
        var setup = new RouteSetup(app, app.CreateClient(Roles.Coordinator));
        var callers = Callers(app);
        var mismatches = new List<string>();

        foreach (var (route, expectation) in RouteTable.Expectations.OrderBy(e => e.Key))
            foreach (var (role, client) in callers)
            {
                using var request = await expectation.Prepare(setup);
                using var response = await client.SendAsync(request);
                var expected = expectation.ExpectedFor(role);
                var who = role ?? "no key";
                if (response.StatusCode != expected)
                    mismatches.Add($"{route} as {who}: expected {(int)expected}, got {(int)response.StatusCode} " +
                                   $"{Shorten(await response.Content.ReadAsStringAsync())}");
                else if (expected is HttpStatusCode.Unauthorized or HttpStatusCode.Forbidden &&
                         response.Content.Headers.ContentType?.MediaType != "application/problem+json")
                    mismatches.Add($"{route} as {who}: {(int)expected} body is '{response.Content.Headers.ContentType}', " +
                                   "not application/problem+json");
            }

        Assert.True(mismatches.Count == 0, $"{mismatches.Count} role-matrix mismatches:\n{string.Join("\n", mismatches)}");
    }

    public sealed record AppRoute(string Method, string Pattern)
    {
        public string Key => $"{Method} {Pattern}";
    }

    /// <summary>Every (method, pattern) the app serves. /swagger is open by contract and not ours to police.</summary>
    public static IReadOnlyList<AppRoute> AppRoutes(CommunityLeadFactory app) =>
        [.. app.Services.GetRequiredService<EndpointDataSource>().Endpoints
            .OfType<RouteEndpoint>()
            .Where(e => e.RoutePattern.RawText?.StartsWith("/swagger", StringComparison.OrdinalIgnoreCase) != true)
            .SelectMany(e => (e.Metadata.GetMetadata<HttpMethodMetadata>()?.HttpMethods ?? ["*"])
                .Select(m => new AppRoute(m, e.RoutePattern.RawText ?? "?")))
            .Distinct()];

    /// <summary>A route pattern with its parameters filled in (a GUID where the route wants one, else a kit code).</summary>
    public static string Fill(string pattern) =>
        Regex.Replace(pattern, @"\{[^}]+\}", p => p.Value.Contains(":guid") ? Guid.NewGuid().ToString() : KitCode.NewCode());

    private static List<(string? Role, HttpClient Client)> Callers(CommunityLeadFactory app) =>
        [(null, app.CreateClient()), .. Roles.All.Select(r => ((string?)r, app.CreateClient(r)))];

    private static string Shorten(string text) => text.Length <= 200 ? text : text[..200] + "…";
}
