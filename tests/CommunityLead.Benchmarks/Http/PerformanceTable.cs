using System.Diagnostics;
using System.Globalization;
using System.IO.Compression;
using System.Net;
using System.Runtime.InteropServices;
using System.Text;

namespace CommunityLead.Benchmarks.Http;

/// <summary>
/// The README's performance table, measured end to end: the service published as deploy/ does, in its own process on Kestrel,
/// traffic over 127.0.0.1, each figure beside a baseline measured in the same run on the same machine.
/// <c>dotnet run -c Release --project tests/CommunityLead.Benchmarks -- table [--quick]</c>; --quick shortens the
/// load runs to 10 s and the summary store to 200,000 kits; <c>--only reads,ingest</c> measures only the parts named
/// (reads: start-up and kit reads; ingest: the lab batches; letters; summary), all of them without it.
/// </summary>
internal sealed class PerformanceTable(bool quick)
{
    private readonly List<string[]> rows = [];
    private readonly string folder = Directory.CreateTempSubdirectory("communitylead-perf-").FullName;
    private TimeSpan LoadDuration => TimeSpan.FromSeconds(quick ? 10 : 30);

    public static async Task<int> RunAsync(string[] args)
    {
        var table = new PerformanceTable(args.Contains("--quick"));
        var only = args.SkipWhile(a => a != "--only").Skip(1).FirstOrDefault()?.Split(',') ?? [];
        string[] parts = ["reads", "ingest", "letters", "summary"];
        if (only.Except(parts).FirstOrDefault() is { } unknown)
        {
            Console.Error.WriteLine($"--only: unknown part '{unknown}'; use {string.Join(", ", parts)}.");
            return 2;
        }
        bool Wanted(string part) => only.Length == 0 || only.Contains(part);
        try
        {
            // --build-only: the Release build as it is, JIT-compiled (quicker to iterate on; not what deploy/ runs).
            if (!args.Contains("--build-only")) RepoPaths.PublishService(Path.Combine(table.folder, "service"));
            if (Wanted("reads")) await table.StartUpAndKitReadsAsync();
            if (Wanted("ingest")) await table.IngestAsync();
            if (Wanted("letters")) await table.LettersAsync();
            if (Wanted("summary")) await table.SummaryAsync();
        }
        finally
        {
            Console.WriteLine();
            Console.WriteLine(table.Render());
            try { Directory.Delete(table.folder, recursive: true); } catch (IOException) { }
        }
        return 0;
    }

    private async Task<(string Database, IReadOnlyList<string> Codes)> StoreAsync(string name, int kits)
    {
        var database = Path.Combine(folder, name + ".db");
        return (database, await StoreSeeder.NewStoreAsync(database, kits));
    }

    private async Task StartUpAndKitReadsAsync()
    {
        var (database, codes) = await StoreAsync("reads", 10_000);
        var coordinator = await Served.KeyAsync(database, "coordinator");
        var lab = await Served.KeyAsync(database, "lab");

        var startUps = new List<TimeSpan>();
        var emptyStartUps = new List<TimeSpan>();
        for (var i = 0; i < 3; i++)
        {
            using (var service = await Served.ServiceAsync(database)) startUps.Add(service.StartUp);
            using (var empty = await Served.EmptyAppAsync()) emptyStartUps.Add(empty.StartUp);
        }
        Add("start-up to the first 200 on /health, existing database (median of 3)", Ms(Median(startUps)), Ms(Median(emptyStartUps)),
            Ratio(Median(startUps), Median(emptyStartUps)), "< 1.5 s");

        using var app = await Served.EmptyAppAsync();
        using var emptyClient = app.Client();
        var baseline = await FixedRateLoad.RunAsync(emptyClient, i => $"/api/kits/{codes[i % codes.Count]}", 1000, LoadDuration);

        using var server = await Served.ServiceAsync(database);
        using var client = server.Client(coordinator);
        await FixedRateLoad.RunAsync(client, i => $"/api/kits/{codes[i % codes.Count]}", 200, TimeSpan.FromSeconds(3)); // warm
        var idle = await FixedRateLoad.RunAsync(client, i => $"/api/kits/{codes[i % codes.Count]}", 1000, LoadDuration);
        Add($"GET /api/kits/{{code}} at 1,000/s for {LoadDuration.TotalSeconds:0} s, idle: p99 (p50), errors",
            $"{Ms(idle.P99)} ({Ms(idle.P50)}), {idle.Errors} errors", $"{Ms(baseline.P99)} ({Ms(baseline.P50)}), {baseline.Errors} errors",
            Ratio(idle.P99, baseline.P99), "p99 < 50 ms, no errors");

        // While a 10,000-row batch for the other 5,000 kits is ingested.
        using var labClient = server.Client(lab);
        var ingest = Batches.PostAsync(labClient, "PERF-READS", Batches.Csv(codes.Skip(5_000).ToList()));
        var busy = await FixedRateLoad.RunAsync(client, i => $"/api/kits/{codes[i % 5_000]}", 1000, LoadDuration);
        var posted = await ingest;
        Add("the same while a 10,000-row batch is ingested: p99 (p50), errors",
            $"{Ms(busy.P99)} ({Ms(busy.P50)}), {busy.Errors} errors; batch {(int)posted.StatusCode}", $"{Ms(baseline.P99)} (idle empty app)",
            Ratio(busy.P99, baseline.P99), "p99 < 200 ms");
    }

    private async Task IngestAsync()
    {
        var (database, all) = await StoreAsync("ingest", 5_200);
        // The first 200 kits' batch is the service's first after it started (EF Core's queries compiled, code JIT-compiled
        // to its first tier): it is timed on its own, and the 10,000-row batch comes after it, as on a service that has run.
        var (first, codes) = (all.Take(200).ToList(), all.Skip(200).ToList());
        var lab = await Served.KeyAsync(database, "lab");
        var csv = Batches.Csv(codes);
        var baseline = Baselines.InsertRows(folder, codes);
        using var server = await Served.ServiceAsync(database);
        using var client = server.Client(lab);
        var idleMemory = server.Process.Memory();
        var firstClock = Stopwatch.StartNew();
        var firstResponse = await Batches.PostAsync(client, "PERF-FIRST", Batches.Csv(first, seed: 3));
        if (firstResponse.StatusCode != HttpStatusCode.Created) throw new InvalidOperationException($"first batch: {(int)firstResponse.StatusCode}");
        Add("the service's first batch after start-up: 400 rows, 200 kits", Seconds(firstClock.Elapsed), "", "", "");
        var cpuBefore = server.Process.CpuTime();
        var clock = Stopwatch.StartNew();
        var response = await Batches.PostAsync(client, "PERF-INGEST", csv);
        var took = clock.Elapsed;
        var cpu = server.Process.CpuTime() - cpuBefore;
        if (response.StatusCode != HttpStatusCode.Created)
            throw new InvalidOperationException($"ingest: {(int)response.StatusCode} {await response.Content.ReadAsStringAsync()}");
        Add("10,000-row CSV batch, 5,000 kits: read, check, QC, store, interpret (one POST)", Seconds(took),
            $"{Ms(baseline)} (the rows alone, prepared INSERTs, one transaction)", Ratio(took, baseline), "≤ 2 s, ≤ 10× the baseline");
        Add("  the service's CPU time for that POST (independent of other load on the machine)", Seconds(cpu), "", "", "");
        Add("  peak memory of the two POSTs above idle", Mb(server.Process.PeakMemory() - idleMemory), "", "", "< 300 MB");

        if (quick) return;
        var (large, largeCodes) = await StoreAsync("ingest-large", 50_000);
        var largeLab = await Served.KeyAsync(large, "lab");
        using var largeServer = await Served.ServiceAsync(large);
        using var largeClient = largeServer.Client(largeLab);
        var largeIdle = largeServer.Process.Memory();
        clock.Restart();
        var largeResponse = await Batches.PostAsync(largeClient, "PERF-LARGE", Batches.Csv(largeCodes));
        Add("100,000-row batch, 50,000 kits: answer, time, peak memory above idle",
            $"{(int)largeResponse.StatusCode}, {Seconds(clock.Elapsed)}, {Mb(largeServer.Process.PeakMemory() - largeIdle)}",
            Ratio(clock.Elapsed, baseline * 10) + " of 10× the 10,000-row baseline", "", "works; < 300 MB");
    }

    private async Task LettersAsync()
    {
        var (database, codes) = await StoreAsync("letters", 1_000);
        var lab = await Served.KeyAsync(database, "lab");
        var coordinator = await Served.KeyAsync(database, "coordinator");
        using var server = await Served.ServiceAsync(database);
        using (var labClient = server.Client(lab))
        {
            var posted = await Batches.PostAsync(labClient, "PERF-LETTERS", Batches.Csv(codes, seed: 7));
            if (posted.StatusCode != HttpStatusCode.Created) throw new InvalidOperationException($"letters' batch: {(int)posted.StatusCode}");
        }
        using var client = server.Client(coordinator);
        var cpuBefore = server.Process.CpuTime();
        var clock = Stopwatch.StartNew();
        var response = await client.PostAsync("/api/letters/batch", null);
        var zip = await response.Content.ReadAsByteArrayAsync();
        var took = clock.Elapsed;
        var cpu = server.Process.CpuTime() - cpuBefore;
        using var archive = new ZipArchive(new MemoryStream(zip));
        var letters = archive.Entries.Where(e => e.FullName.StartsWith("letters/", StringComparison.Ordinal)).ToList();
        var perSecond = letters.Count / took.TotalSeconds;
        var perCpuSecond = letters.Count / cpu.TotalSeconds;
        var baseline = Baselines.OneLinePagesPerSecond();
        Add($"POST /api/letters/batch, {letters.Count:N0} letters (database, recording, hashing, ZIP): letters/s; per CPU-second",
            $"{perSecond:0}/s; {perCpuSecond:0} per CPU-s ({Environment.ProcessorCount} cores)", $"{baseline:0} one-line pages/s on one thread",
            $"{perCpuSecond / baseline:0.00}× per core", "≥ 150 per core, both cores used");
        Add("  size of a letter (mean)", $"{letters.Average(e => e.Length) / 1024:0.0} KB", "", "", "≤ 30 KB");
    }

    private async Task SummaryAsync()
    {
        var kits = quick ? 200_000 : 1_000_000;
        var database = Path.Combine(folder, "summary.db");
        await StoreSeeder.NewSummaryStoreAsync(database, kits);
        var health = await Served.KeyAsync(database, "health");
        using var server = await Served.ServiceAsync(database);
        using var client = server.Client(health);
        var idle = server.Process.Memory();
        // The first report after a change decides the protected set over every kit (ReportRelease); the reports after
        // it, until the next write, are look-ups in that set. Both are figures a health department will meet.
        var first = Stopwatch.StartNew();
        using (var response = await client.GetAsync("/api/reports/summary?groupBy=area"))
        {
            await response.Content.ReadAsByteArrayAsync();
            if (response.StatusCode != HttpStatusCode.OK) throw new InvalidOperationException($"summary: {(int)response.StatusCode}");
        }
        var areaBaseline = Baselines.GroupByCount(database, "h.AreaCode");
        Add($"health summary over {kits:N0} kits: the first report after a change (decides the protected set)", Ms(first.Elapsed),
            $"{Ms(areaBaseline)} (one hand-written GROUP BY count on the file)", Ratio(first.Elapsed, areaBaseline), "≤ 500 ms");
        foreach (var (groupBy, column) in new[] { ("area", "h.AreaCode"), ("month", "k.PeriodMonth"), ("band", "k.LeadBand") })
        {
            var times = new List<TimeSpan>();
            for (var i = 0; i < 3; i++)
            {
                var clock = Stopwatch.StartNew();
                var response = await client.GetAsync($"/api/reports/summary?groupBy={groupBy}");
                await response.Content.ReadAsByteArrayAsync();
                if (response.StatusCode != HttpStatusCode.OK) throw new InvalidOperationException($"summary: {(int)response.StatusCode}");
                times.Add(clock.Elapsed);
            }
            var baseline = Baselines.GroupByCount(database, column);
            Add($"  then by {groupBy}, until the next write (median of 3)", Ms(Median(times)),
                $"{Ms(baseline)} (one hand-written GROUP BY count on the file)", Ratio(Median(times), baseline), "≤ 500 ms");
        }
        Add("  peak memory of the summaries above idle", Mb(server.Process.PeakMemory() - idle), "", "", "bounded");
    }

    private void Add(string what, string measured, string baseline, string ratio, string target)
    {
        rows.Add([what, measured, baseline, ratio, target]);
        Console.WriteLine($"{what}: {measured} | {baseline} | {ratio}");
    }

    private string Render()
    {
        var text = new StringBuilder();
        var cpu = File.Exists("/proc/cpuinfo")
            ? File.ReadLines("/proc/cpuinfo").FirstOrDefault(l => l.StartsWith("model name", StringComparison.Ordinal))?.Split(':')[1].Trim()
            : null;
        text.AppendLine(CultureInfo.InvariantCulture, $"Machine: {Environment.ProcessorCount} cores ({cpu ?? RuntimeInformation.ProcessArchitecture.ToString()}), " +
                        $"{RuntimeInformation.OSDescription}, .NET {Environment.Version}; {(quick ? "--quick" : "full")} run, {DateTime.UtcNow:yyyy-MM-dd}.");
        text.AppendLine();
        text.AppendLine("| what | measured | baseline, same run | ratio | target |");
        text.AppendLine("|---|---|---|---|---|");
        foreach (var row in rows) text.AppendLine("| " + string.Join(" | ", row) + " |");
        return text.ToString();
    }

    private static TimeSpan Median(List<TimeSpan> values) => values.Order().ElementAt(values.Count / 2);
    private static string Ms(TimeSpan t) => t.TotalMilliseconds >= 10_000 ? Seconds(t) : $"{t.TotalMilliseconds:0} ms";
    private static string Seconds(TimeSpan t) => $"{t.TotalSeconds:0.0} s";
    private static string Mb(long bytes) => $"{bytes / 1024.0 / 1024.0:0} MB";
    private static string Ratio(TimeSpan a, TimeSpan b) => b <= TimeSpan.Zero ? "" : $"{a / b:0.0}×";
}
