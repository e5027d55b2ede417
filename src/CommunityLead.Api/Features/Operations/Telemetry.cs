using OpenTelemetry;
using OpenTelemetry.Metrics;
using OpenTelemetry.Resources;
using OpenTelemetry.Trace;

namespace CommunityLead.Api.Features.Operations;

/// <summary>
/// OpenTelemetry traces and metrics: HTTP (ASP.NET Core), EF Core commands and our own work (<see cref="ServiceMetrics"/>,
/// <see cref="ServiceGauges"/>). Metrics are always collected for the admin's Prometheus-format endpoint; both go out
/// by OTLP only when an endpoint is set (<c>OpenTelemetry:OtlpEndpoint</c>, or the standard
/// <c>OTEL_EXPORTER_OTLP_ENDPOINT</c>). Nothing personal leaves in them: HTTP spans drop the query string (a search
/// for a household carries a name or a phone) and EF Core spans carry the SQL text with its parameter names, never
/// the values.
/// </summary>
public static class Telemetry
{
    public static void AddCommunityLeadTelemetry(this IServiceCollection services, IConfiguration configuration)
    {
        services.AddSingleton<ServiceGauges>();
        var otlp = configuration["OpenTelemetry:OtlpEndpoint"] is { Length: > 0 } endpoint ? new Uri(endpoint)
            : configuration["OTEL_EXPORTER_OTLP_ENDPOINT"] is { Length: > 0 } standard ? new Uri(standard) : null;
        services.AddOpenTelemetry()
            .ConfigureResource(resource => resource.AddService("communitylead"))
            .WithTracing(tracing =>
            {
                tracing.AddSource(ServiceMetrics.Name)
                    .AddAspNetCoreInstrumentation(o =>
                    {
                        o.Filter = http => !http.Request.Path.StartsWithSegments("/health");
                        o.EnrichWithHttpRequest = (activity, _) => activity.SetTag("url.query", null);
                    })
                    .AddEntityFrameworkCoreInstrumentation();
                if (otlp is not null) tracing.AddOtlpExporter(o => o.Endpoint = otlp);
            })
            .WithMetrics(metrics =>
            {
                metrics.AddMeter(ServiceMetrics.Name)
                    .AddAspNetCoreInstrumentation()
                    .AddPrometheusExporter();
                if (otlp is not null) metrics.AddOtlpExporter(o => o.Endpoint = otlp);
            });
    }
}
