using BenchmarkDotNet.Running;
using CommunityLead.Benchmarks.Http;

namespace CommunityLead.Benchmarks;

public static class BenchmarkEntry
{
    // table      the README's performance table, through HTTP against the service's own process
    // empty-app  the baseline web app the table starts (not for people)
    // otherwise  BenchmarkDotNet's switcher over the in-process benchmarks (--filter '*')
    public static async Task<int> Main(string[] args)
    {
        switch (args.FirstOrDefault())
        {
            case "table": return await PerformanceTable.RunAsync(args[1..]);
            case "empty-app": EmptyApp.Run(args[1..]); return 0;
            default: BenchmarkSwitcher.FromAssembly(typeof(BenchmarkEntry).Assembly).Run(args); return 0;
        }
    }
}
