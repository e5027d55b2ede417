using System.Net;
using Microsoft.AspNetCore.Http;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// Requests whose connection comes from a given address, as a real client's or proxy's would: the test server has
/// no network, so the address is set on the request itself. Addresses are from the documentation ranges of
/// RFC 5737 (192.0.2.0/24, 198.51.100.0/24, 203.0.113.0/24); nothing is sent anywhere.
/// </summary>
public static class Peer
{
    public static Task<HttpContext> GetAsync(CommunityLeadFactory app, string from, string path,
        string? authorization = null, string? forwardedFor = null, string? forwardedProto = null) =>
        app.Server.SendAsync(context =>
        {
            context.Request.Method = HttpMethods.Get;
            context.Request.Path = path;
            context.Connection.RemoteIpAddress = IPAddress.Parse(from);
            if (authorization is not null) context.Request.Headers.Authorization = authorization;
            if (forwardedFor is not null) context.Request.Headers["X-Forwarded-For"] = forwardedFor;
            if (forwardedProto is not null) context.Request.Headers["X-Forwarded-Proto"] = forwardedProto;
        });

    public static async Task<string> BodyAsync(HttpContext context)
    {
        using var reader = new StreamReader(context.Response.Body);
        return await reader.ReadToEndAsync();
    }
}
