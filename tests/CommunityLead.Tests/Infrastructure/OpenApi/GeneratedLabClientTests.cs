using CommunityLead.Api.Auth;
using CommunityLead.LabClient;
using CommunityLead.LabClient.Api.Models;
using CommunityLead.Tests.Deploy;
using CommunityLead.Tests.Features.Interpretation;

namespace CommunityLead.Tests.Infrastructure.OpenApi;

/// <summary>
/// The example lab client (examples/LabClient) is Kiota's output for the served document: generated again here,
/// it must be what is committed, and it must do a lab's work against the real pipeline.
/// </summary>
// Pages, the API description and the README are the same whichever store is behind them: the PostgreSQL run
// of .ci/run leaves these out (Store=Independent).
[Trait("Store", "Independent")]
public class GeneratedLabClientTests
{
    [Fact]
    public async Task Kiota_FromTheServedDocument_GeneratesTheCommittedClient()
    {
        var work = Path.Combine(Path.GetTempPath(), "communitylead-kiota-" + Guid.NewGuid().ToString("N"));
        var document = await ServedDocument.WriteAsync(work);
        var output = Path.Combine(work, "Generated");

        var (code, log) = await ServedDocument.RunAsync(RepoFiles.PathOf("examples/LabClient"), "bash",
            "generate-client.sh", document, output);

        Assert.True(code == 0, log);
        var committed = RepoFiles.PathOf("examples/LabClient/Generated");
        string[] Sources(string root) => Directory.GetFiles(root, "*.cs", SearchOption.AllDirectories)
            .Select(f => Path.GetRelativePath(root, f)).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(Sources(committed), Sources(output));
        foreach (var file in Sources(committed))
            Assert.True(File.ReadAllText(Path.Combine(committed, file)) == File.ReadAllText(Path.Combine(output, file)),
                $"{file} differs from what Kiota generates now: run examples/LabClient/generate-client.sh on the served document.");
    }

    [Fact]
    public async Task LabClient_PostsAJsonBatchThenReadsTheKitAndTheHealthSummary()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var kit = await flow.ReceivedKitAsync();
        var service = new Uri("http://localhost");
        var lab = LabConnection.Open(service, app.CreateKey(Roles.Lab), app.CreateClient());

        var outcome = await lab.Api.Lab.Batches.PostAsync(new BatchRequest
        {
            BatchId = "B-LABCLIENT-1", Method = "EPA 200.8", AnalyzedAt = "2026-04-05T10:00:00+00:00",
            Results =
            [
                new ResultRow { KitCode = kit, Bottle = "first-draw", Analyte = "lead", Value = 3.2, Unit = "ug/L", Mdl = 0.3, ReportingLimit = 1.0 },
                new ResultRow { KitCode = kit, Bottle = "flushed", Analyte = "lead", Value = 1.1, Unit = "ug/L", Mdl = 0.3, ReportingLimit = 1.0 },
            ],
            Qc = [new QcRow { Type = "calibration-check", Analyte = "lead", Expected = 10.0, Measured = 10.1, Unit = "ug/L" }],
        });
        var read = await lab.Api.Kits[kit].GetAsync();
        var health = LabConnection.Open(service, app.CreateKey(Roles.Health), app.CreateClient());
        var summary = await health.Api.Reports.Summary.GetAsync();

        Assert.Equal(BatchStatus.Accepted, outcome!.Status);
        Assert.Equal(kit, read!.Code);
        Assert.Equal(KitState.Interpreted, read.State);
        Assert.NotNull(summary!.Rows);
    }

    [Fact]
    public async Task LabClient_RefusedBatch_GivesEveryProblemWithItsRow()
    {
        using var app = new CommunityLeadFactory();
        var lab = LabConnection.Open(new Uri("http://localhost"), app.CreateKey(Roles.Lab), app.CreateClient());

        var refused = await Assert.ThrowsAsync<BatchRefusedProblem>(() => lab.Api.Lab.Batches.PostAsync(new BatchRequest
        {
            BatchId = "B-LABCLIENT-2", Method = "EPA 200.8", AnalyzedAt = "2026-04-05T10:00:00+00:00",
            Results = [new ResultRow { KitCode = "NOT-A-KIT", Bottle = "first-draw", Analyte = "lead", Value = 3.2, Unit = "ug/L" }],
            Qc = [],
        }));

        Assert.Equal(422, refused.ResponseStatusCode);
        Assert.Contains(refused.Problems!, p => p.Row == "/results/0" && p.Field == "kitCode");
    }
}
