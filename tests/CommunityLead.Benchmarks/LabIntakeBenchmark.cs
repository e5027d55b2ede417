using System.Net;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using CommunityLead.Benchmarks.Http;

namespace CommunityLead.Benchmarks;

/// <summary>
/// One 10,000-row CSV batch (5,000 kits of one household each, first draw and flushed lead, 1,000 calibration
/// checks) posted over a loopback socket to the service's own process on SQLite: parse, check, QC, store,
/// interpret. Beside it, the baseline: the same rows inserted with one prepared statement in one transaction.
/// Each iteration gets a fresh store, so every post does the same work.
/// </summary>
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 1, iterationCount: 5)]
public class LabIntakeBenchmark
{
    private const int Kits = 5_000;
    private readonly string folder = Directory.CreateTempSubdirectory("communitylead-intake-").FullName;
    private IReadOnlyList<string> codes = [];
    private byte[] csv = [];
    private Served? service;
    private HttpClient? lab;
    private int iteration;

    [IterationSetup(Target = nameof(PostBatch))]
    public void FreshService()
    {
        var database = Path.Combine(folder, $"intake-{iteration++}.db");
        codes = StoreSeeder.NewStoreAsync(database, Kits).GetAwaiter().GetResult();
        csv = Batches.Csv(codes);
        var key = Served.KeyAsync(database, "lab").GetAwaiter().GetResult();
        service = Served.ServiceAsync(database).GetAwaiter().GetResult();
        lab = service.Client(key);
    }

    [Benchmark(Baseline = true, Description = "the 10,000 result rows, prepared INSERTs in one transaction")]
    public TimeSpan InsertRowsAlone() => Baselines.InsertRows(Directory.CreateTempSubdirectory("communitylead-insert-").FullName,
        codes.Count > 0 ? codes : [.. Enumerable.Range(0, Kits).Select(i => $"K{i:00000}")]);

    [Benchmark(Description = "POST the 10,000-row CSV batch")]
    public async Task PostBatch()
    {
        var response = await Batches.PostAsync(lab!, "BENCH-1", csv);
        if (response.StatusCode != HttpStatusCode.Created)
            throw new InvalidOperationException($"{(int)response.StatusCode}: {await response.Content.ReadAsStringAsync()}");
    }

    [IterationCleanup(Target = nameof(PostBatch))]
    public void StopService()
    {
        lab?.Dispose();
        service?.Dispose();
    }
}
