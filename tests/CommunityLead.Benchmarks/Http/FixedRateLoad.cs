using System.Diagnostics;

namespace CommunityLead.Benchmarks.Http;

public sealed record LoadResult(double Rate, int Sent, int Errors, TimeSpan P50, TimeSpan P99, TimeSpan Max);

/// <summary>
/// Sends requests at a fixed rate whatever the answers do, and counts each one's latency from the moment it was
/// due, not from when it was finally sent: a client that waits for slow answers before sending more hides the
/// queue it causes (coordinated omission). A request not answered within the run counts as an error.
/// </summary>
internal static class FixedRateLoad
{
    public static async Task<LoadResult> RunAsync(HttpClient client, Func<int, string> path, double perSecond, TimeSpan duration)
    {
        var count = (int)(perSecond * duration.TotalSeconds);
        var latencies = new double[count];
        var errors = 0;
        var pending = new List<Task>(count);
        var clock = Stopwatch.StartNew();
        for (var i = 0; i < count; i++)
        {
            var due = TimeSpan.FromSeconds(i / perSecond);
            var wait = due - clock.Elapsed;
            if (wait > TimeSpan.FromMilliseconds(1)) await Task.Delay(wait);
            var index = i;
            pending.Add(Task.Run(async () =>
            {
                try
                {
                    using var response = await client.GetAsync(path(index), HttpCompletionOption.ResponseContentRead);
                    if (!response.IsSuccessStatusCode) Interlocked.Increment(ref errors);
                }
                catch (Exception e) when (e is HttpRequestException or TaskCanceledException)
                {
                    Interlocked.Increment(ref errors);
                }
                latencies[index] = (clock.Elapsed - due).TotalMilliseconds;
            }));
        }
        await Task.WhenAll(pending);
        Array.Sort(latencies);
        TimeSpan At(double q) => TimeSpan.FromMilliseconds(latencies[Math.Min(count - 1, (int)Math.Ceiling(q * count) - 1)]);
        return new LoadResult(perSecond, count, errors, At(0.50), At(0.99), TimeSpan.FromMilliseconds(latencies[^1]));
    }
}
