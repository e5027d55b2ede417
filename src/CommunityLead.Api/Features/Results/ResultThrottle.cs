using System.Threading.RateLimiting;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Results;

/// <summary>
/// Lookups per client address, right or wrong, counted in this instance's memory (as the other limits: deploy/README.md).
/// Every lookup counts, so a guesser learns nothing from which ones were refused.
/// </summary>
public sealed class ResultThrottle(IOptions<ResultAccessOptions> options) : IDisposable
{
    private readonly PartitionedRateLimiter<string> limiter = PartitionedRateLimiter.Create<string, string>(address =>
        RateLimitPartition.GetFixedWindowLimiter(address, _ => new FixedWindowRateLimiterOptions
        {
            PermitLimit = options.Value.LookupsPerAddress, Window = options.Value.Window, QueueLimit = 0,
        }));

    public TimeSpan Window => options.Value.Window;

    public bool TryTake(string address) => limiter.AttemptAcquire(address).IsAcquired;

    public void Dispose() => limiter.Dispose();
}
