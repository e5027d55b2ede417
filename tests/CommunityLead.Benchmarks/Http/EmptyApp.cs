using Microsoft.AspNetCore.Builder;
using Microsoft.AspNetCore.Http;
using Microsoft.Extensions.Logging;

namespace CommunityLead.Benchmarks.Http;

/// <summary>
/// The baseline web app: ASP.NET Core with nothing of ours, answering a kit-sized JSON document. Whatever latency
/// or start-up it shows at a rate is the machine's and the framework's, not the service's.
/// </summary>
internal static class EmptyApp
{
    public static void Run(string[] args)
    {
        var builder = WebApplication.CreateSlimBuilder(args);
        builder.Logging.ClearProviders();
        var app = builder.Build();
        app.MapGet("/health", () => Results.Ok(new { status = "ok", database = "reachable" }));
        app.MapGet("/api/kits/{code}", (string code) => Results.Ok(new
        {
            code, kind = "water", state = "received", issuedAt = DateTimeOffset.UnixEpoch,
            samples = new[] { new { bottle = "first-draw", volumeMl = 1000 }, new { bottle = "flushed", volumeMl = 1000 } },
        }));
        app.Run();
    }
}
