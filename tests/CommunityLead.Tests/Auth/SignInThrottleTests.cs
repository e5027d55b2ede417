using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Http;

namespace CommunityLead.Tests.Auth;

/// <summary>Failed sign-ins are limited per client address and per key id, answered 429 with Retry-After, and logged.</summary>
public class SignInThrottleTests
{
    private const string Attacker = "203.0.113.7";
    private const string Neighbour = "198.51.100.20";

    private static string WrongSecret(string key) => key[..key.LastIndexOf('_')] + "_" + new string('0', 64);

    [Fact]
    public async Task SignIn_FailuresFromOneAddressPastTheLimit_429WithRetryAfterEvenForARealKey()
    {
        using var app = new CommunityLeadFactory { Settings = { ["RateLimits:FailedSignInsPerAddress"] = "3", ["RateLimits:FailedSignInWindow"] = "00:10:00" } };
        var key = app.CreateKey(Roles.Coordinator);
        for (var i = 0; i < 3; i++)
            Assert.Equal(401, (await Peer.GetAsync(app, Attacker, "/api/kits", $"Bearer clk_{i:x16}_{new string('1', 64)}")).Response.StatusCode);

        var refused = await Peer.GetAsync(app, Attacker, "/api/kits", $"Bearer {key}");

        await ExpectTooManyAsync(refused, within: TimeSpan.FromMinutes(10));
        // Another address is not held back by the first one's failures.
        Assert.Equal(200, (await Peer.GetAsync(app, Neighbour, "/api/kits", $"Bearer {key}")).Response.StatusCode);
        // /health stays open to anyone, so a balancer still sees the instance is up.
        Assert.Equal(200, (await Peer.GetAsync(app, Attacker, "/health", "Bearer not-a-key")).Response.StatusCode);
    }

    [Fact]
    public async Task SignIn_FailuresNamingOneKeyIdFromManyAddresses_429ForThatKeyIdOnly()
    {
        using var app = new CommunityLeadFactory { Settings = { ["RateLimits:FailedSignInsPerKeyId"] = "2" } };
        var key = app.CreateKey(Roles.Lab);
        var other = app.CreateKey(Roles.Lab);
        Assert.Equal(401, (await Peer.GetAsync(app, "203.0.113.1", "/api/lab/batches", $"Bearer {WrongSecret(key)}")).Response.StatusCode);
        Assert.Equal(401, (await Peer.GetAsync(app, "203.0.113.2", "/api/lab/batches", $"Bearer {WrongSecret(key)}")).Response.StatusCode);

        await ExpectTooManyAsync(await Peer.GetAsync(app, "203.0.113.3", "/api/lab/batches", $"Bearer {key}"), within: TimeSpan.FromMinutes(5));
        Assert.Equal(200, (await Peer.GetAsync(app, "203.0.113.3", "/api/lab/batches", $"Bearer {other}")).Response.StatusCode);
    }

    [Fact]
    public async Task SignIn_ClientsBehindAKnownProxy_CountedByTheirForwardedAddress()
    {
        const string Proxy = "192.0.2.10";
        using var app = new CommunityLeadFactory { Settings = { ["RateLimits:FailedSignInsPerAddress"] = "2", ["ForwardedHeaders:KnownProxies:0"] = Proxy } };
        var key = app.CreateKey(Roles.Coordinator);
        for (var i = 0; i < 2; i++)
            await Peer.GetAsync(app, Proxy, "/api/kits", "Bearer wrong", forwardedFor: Attacker);

        await ExpectTooManyAsync(await Peer.GetAsync(app, Proxy, "/api/kits", $"Bearer {key}", forwardedFor: Attacker), within: TimeSpan.FromMinutes(5));
        // The proxy's other clients are not locked out with the one who failed.
        Assert.Equal(200, (await Peer.GetAsync(app, Proxy, "/api/kits", $"Bearer {key}", forwardedFor: Neighbour)).Response.StatusCode);
    }

    [Fact]
    public async Task SignIn_Failure_LoggedWithKeyIdAndAddressNeverTheSecret()
    {
        using var app = new CommunityLeadFactory();
        var key = app.CreateKey(Roles.Coordinator);
        var wrong = WrongSecret(key);
        var keyId = key.Split('_')[1];

        Assert.Equal(401, (await Peer.GetAsync(app, Attacker, "/api/kits", $"Bearer {wrong}")).Response.StatusCode);
        Assert.Equal(401, (await Peer.GetAsync(app, Neighbour, "/api/kits", "Bearer s3cret-pasted-by-mistake")).Response.StatusCode);

        var logged = app.Warnings.Entries.Where(e => e.Contains("Failed sign-in", StringComparison.Ordinal)).ToList();
        Assert.Equal(2, logged.Count);
        Assert.Contains(logged, e => e.Contains(Attacker) && e.Contains($"key id {keyId}"));
        Assert.Contains(logged, e => e.Contains(Neighbour) && e.Contains("key id none"));
        // Neither the wrong secret nor the real one, nor text that was not a key, reaches any log entry.
        Assert.All(app.Warnings.Entries, e =>
        {
            Assert.DoesNotContain(wrong.Split('_')[2], e);
            Assert.DoesNotContain(key.Split('_')[2], e);
            Assert.DoesNotContain("s3cret", e);
        });
    }

    private static async Task ExpectTooManyAsync(HttpContext answer, TimeSpan within)
    {
        Assert.Equal(StatusCodes.Status429TooManyRequests, answer.Response.StatusCode);
        // Retry-After in delay-seconds (RFC 9110 §10.2.3), no longer than the window.
        var seconds = int.Parse(answer.Response.Headers.RetryAfter.ToString());
        Assert.InRange(seconds, 1, (int)within.TotalSeconds);
        Assert.Equal("application/problem+json", answer.Response.ContentType);
        var problem = JsonNode.Parse(await Peer.BodyAsync(answer))!;
        Assert.Equal(429, problem["status"]!.GetValue<int>());
        Assert.Contains($"{seconds} s", problem["detail"]!.GetValue<string>());
    }
}
