using System.Diagnostics;
using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Npgsql;
using OpenTelemetry.Trace;

namespace CommunityLead.Tests.Features.Operations;

/// <summary>Liveness, readiness, the admin's metrics, and what the traces and logs may carry.</summary>
public class OperationsTests
{
    [Fact]
    public async Task Health_LiveAndReady_200WithoutAKey()
    {
        using var app = new CommunityLeadFactory();
        var anonymous = app.CreateClient();

        Assert.Equal(HttpStatusCode.OK, (await anonymous.GetAsync("/health/live")).StatusCode);
        var ready = await anonymous.GetAsync("/health/ready");
        Assert.Equal(HttpStatusCode.OK, ready.StatusCode);
        Assert.Equal("Healthy", await ready.Content.ReadAsStringAsync());
    }

    [Fact]
    public async Task Health_DatabaseUnreachable_ReadyIs503AndLiveStays200()
    {
        using var app = new CommunityLeadFactory();
        var missing = TestStore.IsPostgres
            ? new NpgsqlConnectionStringBuilder(app.ConnectionString) { Database = "cl_never_created" }.ConnectionString
            : "Data Source=/cl-never-created/x.db";
        using var broken = app.WithWebHostBuilder(b =>
        {
            b.UseSetting("Database:MigrateOnStartup", "false");
            b.UseSetting("ConnectionStrings:CommunityLead", missing);
        });
        var anonymous = broken.CreateClient();

        Assert.Equal(HttpStatusCode.ServiceUnavailable, (await anonymous.GetAsync("/health/ready")).StatusCode);
        Assert.Equal(HttpStatusCode.OK, (await anonymous.GetAsync("/health/live")).StatusCode);
    }

    [Fact]
    public async Task Metrics_AfterABatchAndALetter_AdminReadsThemInPrometheusFormat()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 12, flushed: 3);
        Assert.Equal(HttpStatusCode.OK, (await flow.Coordinator.GetAsync($"/api/kits/{code}/letter")).StatusCode);
        var admin = app.CreateClient(Roles.Admin);

        var response = await admin.GetAsync("/api/admin/metrics");
        var text = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        // Prometheus text exposition format: "# TYPE name kind", then "name{labels} value" (prometheus.io, exposition formats).
        Assert.Contains("# TYPE communitylead_lab_batches_total counter", text);
        Assert.Matches("communitylead_lab_batches_total\\{[^}]*verdict=\"accepted\"[^}]*\\} [1-9]", text);
        Assert.Matches("communitylead_interpretations_total\\{[^}]*band=\"action\"[^}]*\\} [1-9]", text);
        Assert.Matches("communitylead_letters_issued_total(\\{[^}]*\\})? [1-9]", text);
        Assert.Matches("communitylead_attention_open\\{[^}]*reason=\"action-level-vulnerable-home\"[^}]*\\} 1", text);
        Assert.Matches("communitylead_interpretation_backlog(\\{[^}]*\\})? 0", text);
        Assert.DoesNotContain(code, text);
    }

    [Fact]
    public async Task Telemetry_FlowWithPersonalData_NoSpanTagOrLogCarriesIt()
    {
        var spans = new List<Activity>();
        var log = new CapturedLog();
        var app = new CommunityLeadFactory(services: s =>
        {
            s.ConfigureOpenTelemetryTracerProvider(t => t.AddInMemoryExporter(spans));
            s.AddSingleton<ILoggerProvider>(log);
        });
        var flow = new ResultsFlow(app);
        // The span listeners are process-wide: spans of other tests' services, running beside this one, land in the same
        // list. Our requests carry one trace (W3C Trace Context, traceparent header) so that ours can be told apart.
        var trace = ActivityTraceId.CreateRandom();
        foreach (var client in new[] { flow.Coordinator, flow.Lab })
            client.DefaultRequestHeaders.Add("traceparent", $"00-{trace}-{ActivitySpanId.CreateRandom()}-01");
        string[] personal = ["Philippa Quarrendon", "+1 555 0199", "quarrendon@example.net", "88 Wicklow Steps"];
        var code = await flow.ReceivedKitAsync(h =>
        {
            h["name"] = personal[0];
            h["phone"] = personal[1];
            h["email"] = personal[2];
            h["address"]!["line1"] = personal[3];
        });
        await flow.PostLeadAsync(code, firstDraw: 14, flushed: 2);
        await flow.Coordinator.GetAsync("/api/households?search=Quarrendon");
        await flow.Coordinator.GetAsync($"/api/households?search={Uri.EscapeDataString(personal[1])}");
        await flow.Coordinator.GetAsync($"/api/kits/{code}/letter");
        // Stopping the service stops its tracer provider: nothing more is appended to the list while it is read.
        app.Dispose();

        var database = DatabaseName(app.ConnectionString);
        // Ours: the requests' trace, and the background work's commands on this test's own database.
        var ours = spans.Where(s => s.TraceId == trace || Equals(s.GetTagItem("db.name"), database)).ToList();
        Assert.Contains(ours, s => s.Kind == ActivityKind.Server && s.TraceId == trace);
        Assert.Contains(ours, s => s.TraceId == trace && s.Tags.Any(t => t.Key.StartsWith("db.", StringComparison.Ordinal)));
        // The database's name is a random one per test: any four digits may turn up in it.
        var written = ours.SelectMany(s => s.Tags.Select(t => $"{s.DisplayName} {t.Key}={t.Value}")
                .Concat(s.Events.Select(e => $"{s.DisplayName} event {e.Name}")))
            .Concat(log.Entries.Select(e => $"{e.Category}: {e.Message}"))
            .Select(line => line.Replace(database, "<database>", StringComparison.Ordinal)).ToList();
        foreach (var value in personal.Append("Quarrendon").Append("0199"))
            Assert.DoesNotContain(written, line => line.Contains(value, StringComparison.OrdinalIgnoreCase));
    }

    private static string DatabaseName(string connectionString) => TestStore.IsPostgres
        ? new NpgsqlConnectionStringBuilder(connectionString).Database!
        : new Microsoft.Data.Sqlite.SqliteConnectionStringBuilder(connectionString).DataSource;
}
