using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Hosting;
using Npgsql;

namespace CommunityLead.Tests.Features.Operations;

/// <summary>Liveness, readiness and the admin's metrics; what the traces and logs may carry is TelemetryPrivacyTests.</summary>
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
}
