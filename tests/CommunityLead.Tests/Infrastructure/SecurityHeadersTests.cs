using System.Net;
using CommunityLead.Api.Auth;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>Headers every answer carries, HSTS only over HTTPS as a known proxy says, and the Swagger UI setting.</summary>
public class SecurityHeadersTests
{
    private const string Proxy = "192.0.2.10";

    [Theory]
    [InlineData("/health", null, HttpStatusCode.OK)]
    [InlineData("/api/kits", null, HttpStatusCode.Unauthorized)]
    [InlineData("/api/kits", Roles.Health, HttpStatusCode.Forbidden)]
    [InlineData("/api/kits?page=0", Roles.Coordinator, HttpStatusCode.BadRequest)]
    [InlineData("/api/no-such-route", Roles.Coordinator, HttpStatusCode.NotFound)]
    public async Task Headers_EveryAnswer_NosniffNoReferrerAndAFrameRefusingPolicy(string path, string? role, HttpStatusCode expected)
    {
        using var app = new CommunityLeadFactory();
        var response = await (role is null ? app.CreateClient() : app.CreateClient(role)).GetAsync(path);

        Assert.Equal(expected, response.StatusCode);
        // Header values as OWASP's HTTP Headers cheat sheet recommends them.
        Assert.Equal("nosniff", Header(response, "X-Content-Type-Options"));
        Assert.Equal("no-referrer", Header(response, "Referrer-Policy"));
        var policy = Header(response, "Content-Security-Policy");
        Assert.Contains("default-src 'self'", policy);
        Assert.Contains("frame-ancestors 'none'", policy);
        Assert.DoesNotContain("unsafe", policy);
        Assert.False(response.Headers.Contains("Strict-Transport-Security"), "plain HTTP never gets HSTS");
    }

    [Theory]
    [InlineData(Proxy, "https", true)]
    [InlineData("198.51.100.20", "https", false)] // anyone can send the header; only a known proxy is believed
    [InlineData(Proxy, "http", false)]
    [InlineData(Proxy, null, false)]
    public async Task Hsts_OnlyWhenAKnownProxySaysTheRequestWasHttps(string from, string? forwardedProto, bool expected)
    {
        using var app = new CommunityLeadFactory { Settings = { ["ForwardedHeaders:KnownProxies:0"] = Proxy } };

        var answer = await Peer.GetAsync(app, from, "/health", forwardedFor: "203.0.113.7", forwardedProto: forwardedProto);

        Assert.Equal(200, answer.Response.StatusCode);
        // RFC 6797 §7.2: HSTS is sent over secure transport only.
        Assert.Equal(expected, answer.Response.Headers.ContainsKey("Strict-Transport-Security"));
        if (expected) Assert.Equal("max-age=31536000", answer.Response.Headers.StrictTransportSecurity.ToString());
    }

    [Fact]
    public async Task Swagger_OnBySetting_ServedWithItsOwnPolicyAndNoInlineScript()
    {
        using var app = new CommunityLeadFactory { Settings = { ["Swagger:Enabled"] = "true" } };
        var page = await app.CreateClient().GetAsync("/swagger/index.html");

        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        var policy = Header(page, "Content-Security-Policy");
        Assert.Contains("script-src 'self';", policy);
        Assert.Contains("frame-ancestors 'none'", policy);
        // The page loads its scripts from files; an inline one would be blocked by script-src 'self'.
        var html = await page.Content.ReadAsStringAsync();
        Assert.DoesNotMatch(@"<script(?![^>]*\bsrc=)[^>]*>", html);
    }

    [Fact]
    public async Task Swagger_OutsideDevelopmentByDefault_NotServed()
    {
        using var app = new CommunityLeadFactory(); // environment "Testing", no setting
        Assert.Equal(HttpStatusCode.NotFound, (await app.CreateClient(Roles.Admin).GetAsync("/swagger/v1/swagger.json")).StatusCode);
        Assert.Equal(HttpStatusCode.NotFound, (await app.CreateClient(Roles.Admin).GetAsync("/swagger/index.html")).StatusCode);
    }

    private static string Header(HttpResponseMessage response, string name) =>
        response.Headers.TryGetValues(name, out var values) ? string.Join(", ", values) : "";
}
