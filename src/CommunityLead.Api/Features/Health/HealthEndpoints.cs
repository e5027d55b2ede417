using CommunityLead.Api.Data;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Health;

public sealed record HealthStatus(string Status, string Database);

public static class HealthEndpoints
{
    /// <summary>
    /// GET /health, open without a key: what a load balancer or the container's health check asks. It answers
    /// 503 when the database cannot be reached, so a balancer stops sending work to an instance that would only
    /// fail it; the answer names no server, file or error (anyone may call it).
    /// </summary>
    public static void MapHealth(this IEndpointRouteBuilder app) =>
        app.MapGet("/health", Check).AllowAnonymous().WithTags("Health").WithName("checkHealth")
            .WithSummary("Whether this instance can reach its database (no key needed)")
            .Produces<HealthStatus>(StatusCodes.Status503ServiceUnavailable);

    private static async Task<Results<Ok<HealthStatus>, JsonHttpResult<HealthStatus>>> Check(CommunityLeadDb db, CancellationToken ct)
    {
        if (await db.Database.CanConnectAsync(ct)) return TypedResults.Ok(new HealthStatus("ok", "reachable"));
        return TypedResults.Json(new HealthStatus("unavailable", "unreachable"), statusCode: StatusCodes.Status503ServiceUnavailable);
    }
}
