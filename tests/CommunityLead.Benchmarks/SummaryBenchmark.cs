using System.Net;
using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using CommunityLead.Benchmarks.Http;

namespace CommunityLead.Benchmarks;

/// <summary>
/// The health department's summary over 1,000,000 interpreted kits (200,000 homes, five areas, two years), each
/// with first-draw and flushed lead results, asked over a loopback socket of the service's own process. Beside
/// it, the baseline: one hand-written GROUP BY count over the same file.
/// </summary>
[SimpleJob(RunStrategy.Monitoring, launchCount: 1, warmupCount: 1, iterationCount: 5)]
public class SummaryBenchmark
{
    private const int Kits = 1_000_000;
    private readonly string database = Path.Combine(Directory.CreateTempSubdirectory("communitylead-summary-").FullName, "summary.db");
    private Served? service;
    private HttpClient? health;

    [Params("area", "month", "band")]
    public string GroupBy { get; set; } = "area";

    [GlobalSetup]
    public void Seed()
    {
        StoreSeeder.NewSummaryStoreAsync(database, Kits).GetAwaiter().GetResult();
        var key = Served.KeyAsync(database, "health").GetAwaiter().GetResult();
        service = Served.ServiceAsync(database).GetAwaiter().GetResult();
        health = service.Client(key);
    }

    [Benchmark(Baseline = true, Description = "one GROUP BY count on the file")]
    public TimeSpan GroupByAlone() => Baselines.GroupByCount(database, GroupBy switch
    {
        "area" => "h.AreaCode", "month" => "k.PeriodMonth", _ => "k.LeadBand",
    });

    [Benchmark(Description = "GET the summary of 1,000,000 kits")]
    public async Task<int> Summary()
    {
        var response = await health!.GetAsync($"/api/reports/summary?groupBy={GroupBy}");
        if (response.StatusCode != HttpStatusCode.OK)
            throw new InvalidOperationException($"{(int)response.StatusCode}: {await response.Content.ReadAsStringAsync()}");
        return (await response.Content.ReadAsByteArrayAsync()).Length;
    }

    [GlobalCleanup]
    public void Cleanup()
    {
        health?.Dispose();
        service?.Dispose();
    }
}
