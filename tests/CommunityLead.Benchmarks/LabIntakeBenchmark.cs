using System.Net;
using System.Text;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using CommunityLead.Api.Auth;
using CommunityLead.Rules.Kits;

namespace CommunityLead.Benchmarks;

/// <summary>
/// One 10,000-row CSV batch (5,000 kits × first draw and flushed lead, 1,000 calibration checks) posted to
/// the real service on SQLite: parse, check every row, compute QC, store, move 5,000 kits to analyzed.
/// Each iteration gets a fresh database so every post does the same work.
/// </summary>
[MemoryDiagnoser]
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 1, iterationCount: 5)]
public class LabIntakeBenchmark
{
    private const int Kits = 5_000;
    private string[] codes = [];
    private byte[] csv = [];
    private BenchmarkHost? host;
    private HttpClient? lab;

    [GlobalSetup]
    public void BuildBatch()
    {
        codes = [.. Enumerable.Range(0, Kits).Select(_ => KitCode.NewCode()).Distinct()];
        var text = new StringBuilder("sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit,expected,measured\n");
        var random = new Random(42);
        foreach (var code in codes)
        {
            text.Append($"sample,{code},first-draw,lead,{random.Next(10, 300) / 10.0:0.0},ug/L,0.3,1.0,,\n");
            text.Append($"sample,{code},flushed,lead,{random.Next(10, 100) / 10.0:0.0},ug/L,0.3,1.0,,\n");
        }
        for (var i = 0; i < codes.Length * 2 / 10; i++) text.Append("calibration-check,,,lead,,ug/L,,,10,10.1\n");
        text.Append("calibration-blank,,,lead,,ug/L,,,0,0.02\n");
        csv = Encoding.UTF8.GetBytes(text.ToString());
    }

    [IterationSetup]
    public void FreshService()
    {
        host = new BenchmarkHost();
        host.SeedReceivedKits(codes);
        lab = host.ClientFor(Roles.Lab);
    }

    [Benchmark(Description = "POST 10,000-row CSV batch")]
    public async Task PostBatch()
    {
        using var content = new ByteArrayContent(csv);
        content.Headers.ContentType = new("text/csv");
        var response = await lab!.PostAsync("/api/lab/batches?batchId=BENCH-1&method=EPA%20200.8&analyzedAt=2026-04-05T10:00:00%2B00:00", content);
        if (response.StatusCode != HttpStatusCode.Created)
            throw new InvalidOperationException($"{(int)response.StatusCode}: {await response.Content.ReadAsStringAsync()}");
    }

    [IterationCleanup]
    public void Dispose()
    {
        lab?.Dispose();
        host?.Dispose();
    }
}
