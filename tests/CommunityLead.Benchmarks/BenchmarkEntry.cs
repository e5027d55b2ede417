using BenchmarkDotNet.Running;
using CommunityLead.Benchmarks.Http;

namespace CommunityLead.Benchmarks;

public static class BenchmarkEntry
{
    // table      the README's performance table, through HTTP against the service's own process
    // seed DB N  a migrated store at DB with N received water kits, and DB.csv: the lab's batch for them (for profiling
    //            the service by hand: README, Speed)
    // summary-store DB N  a migrated store at DB with N interpreted kits, as the table's summary store (for profiling
    //            reports by hand)
    // load URL KEY RATE SECONDS  GET /api/kits/{code} at RATE per second on a running service, for profiling by hand
    // empty-app  the baseline web app the table starts (not for people)
    // otherwise  BenchmarkDotNet's switcher over the in-process benchmarks (--filter '*')
    public static async Task<int> Main(string[] args)
    {
        switch (args.FirstOrDefault())
        {
            case "table": return await PerformanceTable.RunAsync(args[1..]);
            case "empty-app": EmptyApp.Run(args[1..]); return 0;
            case "seed" when args.Length == 3 && int.TryParse(args[2], out var kits) && kits > 0:
                await File.WriteAllBytesAsync(args[1] + ".csv", Batches.Csv(await StoreSeeder.NewStoreAsync(Path.GetFullPath(args[1]), kits)));
                return 0;
            case "summary-store" when args.Length == 3 && int.TryParse(args[2], out var interpreted) && interpreted > 0:
                await StoreSeeder.NewSummaryStoreAsync(Path.GetFullPath(args[1]), interpreted);
                return 0;
            case "load" when args.Length == 5 && double.TryParse(args[3], out var rate) && int.TryParse(args[4], out var seconds):
            {
                using var client = new HttpClient { BaseAddress = new Uri(args[1]) };
                client.DefaultRequestHeaders.Authorization = new("Bearer", args[2]);
                var page = System.Text.Json.JsonDocument.Parse(await client.GetStringAsync("/api/kits?pageSize=200"));
                var codes = page.RootElement.GetProperty("items").EnumerateArray().Select(k => k.GetProperty("code").GetString()!).ToList();
                var result = await FixedRateLoad.RunAsync(client, i => $"/api/kits/{codes[i % codes.Count]}", rate, TimeSpan.FromSeconds(seconds));
                Console.WriteLine(result);
                return 0;
            }
            case "seed" or "summary-store":
                Console.Error.WriteLine($"usage: {args[0]} DATABASE KITS (a new SQLite file, a whole number of kits)");
                return 2;
            default: BenchmarkSwitcher.FromAssembly(typeof(BenchmarkEntry).Assembly).Run(args); return 0;
        }
    }
}
