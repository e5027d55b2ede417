using System.Diagnostics;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Npgsql;
using OpenTelemetry.Trace;

namespace CommunityLead.Tests.Features.Operations;

/// <summary>
/// Spans are made by process-wide listeners (ActivitySource, DiagnosticListener): with other tests' services starting
/// and stopping beside it, this test read their spans, and sometimes found no database spans of its own, so it runs alone.
/// </summary>
[CollectionDefinition(nameof(ProcessWideTelemetry), DisableParallelization = true)]
public sealed class ProcessWideTelemetry;

/// <summary>What the traces and logs may carry: no personal data, whatever a request held.</summary>
[Collection(nameof(ProcessWideTelemetry))]
public class TelemetryPrivacyTests
{
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
        await UntilDatabaseSpansAsync(app, spans);
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

    /// <summary>
    /// EF Core remembers for a while (its logging cache time) that no one listened to its command diagnostics: a service
    /// started soon after another one stopped makes no database spans at first (seen here: none in this test's whole flow
    /// when it ran right after another test's service, all of them once it waited 3 s). Reading until a request of its
    /// own is traced down to the database keeps the test from passing on a flow whose commands were never looked at.
    /// </summary>
    private static async Task UntilDatabaseSpansAsync(CommunityLeadFactory app, List<Activity> spans)
    {
        var warmUp = app.CreateClient(Roles.Coordinator);
        var trace = ActivityTraceId.CreateRandom();
        warmUp.DefaultRequestHeaders.Add("traceparent", $"00-{trace}-{ActivitySpanId.CreateRandom()}-01");
        for (var waited = Stopwatch.StartNew(); waited.Elapsed < TimeSpan.FromSeconds(15); await Task.Delay(200))
        {
            await warmUp.GetAsync("/api/households");
            // By index: the service's background work may add spans meanwhile, which would break an enumerator.
            for (var i = 0; i < spans.Count; i++)
                if (spans[i] is { } span && span.TraceId == trace && span.Tags.Any(t => t.Key.StartsWith("db.", StringComparison.Ordinal)))
                    return;
        }
        Assert.Fail("No request was traced down to the database within 15 s.");
    }

    private static string DatabaseName(string connectionString) => TestStore.IsPostgres
        ? new NpgsqlConnectionStringBuilder(connectionString).Database!
        : new Microsoft.Data.Sqlite.SqliteConnectionStringBuilder(connectionString).DataSource;
}
