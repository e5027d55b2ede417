using System.Net;
using Microsoft.AspNetCore.HttpOverrides;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Settings of the "ForwardedHeaders" section: the reverse proxies whose X-Forwarded-For and X-Forwarded-Proto
/// are believed. Nothing else is: any client can send those headers, so they count only when the connection
/// comes from a proxy named here. With neither list set, a proxy on the same machine (loopback) is trusted.
/// </summary>
public sealed class ForwardingOptions
{
    public const string Section = "ForwardedHeaders";

    /// <summary>Addresses of trusted proxies ("10.0.0.5"); replaces the loopback default when set.</summary>
    public string[] KnownProxies { get; set; } = [];

    /// <summary>Networks of trusted proxies in CIDR form ("172.16.0.0/12"); replaces the loopback default when set.</summary>
    public string[] KnownNetworks { get; set; } = [];
}

public static class ForwardingSetup
{
    public static void AddCommunityLeadForwarding(this IServiceCollection services) =>
        services.AddOptions<ForwardedHeadersOptions>().Configure<IOptions<ForwardingOptions>>((options, settings) =>
        {
            // The client's address (for the sign-in limits and the logs) and whether it came over HTTPS (for HSTS).
            // Never X-Forwarded-Host: the service builds no absolute URLs, so it has no use for a host a proxy claims.
            options.ForwardedHeaders = ForwardedHeaders.XForwardedFor | ForwardedHeaders.XForwardedProto;
            // No fixed hop count: entries are read from the right only while the hop that added them is a known
            // proxy, so a TLS proxy in front of a balancer works and a client's own entries are never reached.
            options.ForwardLimit = null;
            var (proxies, networks) = (settings.Value.KnownProxies, settings.Value.KnownNetworks);
            if (proxies.Length == 0 && networks.Length == 0) return; // the framework's default: loopback only
            options.KnownProxies.Clear();
            options.KnownIPNetworks.Clear();
            foreach (var proxy in proxies) options.KnownProxies.Add(IPAddress.Parse(proxy));
            foreach (var network in networks) options.KnownIPNetworks.Add(System.Net.IPNetwork.Parse(network));
        });
}
