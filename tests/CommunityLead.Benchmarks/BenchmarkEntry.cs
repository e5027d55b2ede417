using BenchmarkDotNet.Running;

namespace CommunityLead.Benchmarks;

public static class BenchmarkEntry
{
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(BenchmarkEntry).Assembly).Run(args);
}
