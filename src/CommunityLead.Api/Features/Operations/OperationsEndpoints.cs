using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using Microsoft.AspNetCore.Diagnostics.HealthChecks;
using Microsoft.Extensions.Diagnostics.HealthChecks;

namespace CommunityLead.Api.Features.Operations;

/// <summary>
/// What an operator or an orchestrator asks the service: is the process alive (liveness: no dependency is checked,
/// so a slow database never gets a healthy process restarted), can it take work (readiness: the database answers),
/// and its metrics in Prometheus text format (admin key). <c>GET /health</c> stays as it was.
/// </summary>
public static class OperationsEndpoints
{
    private const string Ready = "ready";

    public static void AddCommunityLeadHealthChecks(this IServiceCollection services) =>
        services.AddHealthChecks().AddDbContextCheck<CommunityLeadDb>("database", tags: [Ready]);

    // GET /health/live     200 while the process runs                        anonymous
    // GET /health/ready    200 when the database answers, else 503           anonymous
    // GET /api/admin/metrics  Prometheus text format                         admin
    public static void MapOperations(this WebApplication app)
    {
        app.MapHealthChecks("/health/live", new HealthCheckOptions { Predicate = _ => false }).AllowAnonymous();
        app.MapHealthChecks("/health/ready", new HealthCheckOptions { Predicate = check => check.Tags.Contains(Ready) }).AllowAnonymous();
        // The gauges' instruments are made with the instance; resolving them here makes them exist before the first scrape.
        app.Services.GetRequiredService<ServiceGauges>();
        app.MapPrometheusScrapingEndpoint("/api/admin/metrics").RequireAuthorization(Policies.Admin);
    }
}
